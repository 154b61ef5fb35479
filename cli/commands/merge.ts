/**
 * `tenuis merge FILE... --out DIR`: combines sample files (tenuis run --save-samples) of replicas of one case into
 * one result, as if they had run together. Files are read as bytes and decoded by the versioned sample-file reader,
 * which refuses damaged files and files of different cases with a message naming the file and the problem.
 */
import { readFileSync } from 'node:fs';
import { decodeSampleSet } from '../../engine/io/sampleFile';
import { mergeSampleSets } from '../../engine/results/mergeSamples';
import { summarizeSamples } from '../../engine/results/summarize';
import { resultFiles } from '../../engine/report/resultFiles';
import { CliError, EXIT_OK } from '../errors';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { prettyJson } from '../prettyJson';
import { defineCommand } from '../command';

export const MERGE_USAGE = `Usage:
  tenuis merge FILE... --out DIR [--quiet]

Combines sample files written by tenuis run --save-samples (replicas of one case, e.g. run on many machines with
different seeds) into one result with error bars from all of them, written into DIR like tenuis run does.`;

export const mergeCommand = defineCommand({
  name: 'merge',
  summary: '  tenuis merge FILE... --out DIR             merge saved sample files of one case into one result',
  usage: MERGE_USAGE,
  options: { out: { type: 'string', short: 'o' }, quiet: { type: 'boolean', short: 'q' } },
  run({ values, positionals }, { io, usageError }) {
    if (positionals.length === 0) throw usageError('merge needs at least one sample file');
    if (!values.out) throw usageError('merge needs an output folder: --out DIR');
    checkOutputDir(values.out);
    const sets = positionals.map((file) => {
      let bytes: Buffer;
      try {
        bytes = readFileSync(file);
      } catch (e) {
        throw new CliError(`${file}: cannot read it (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
      }
      try {
        return decodeSampleSet(
          bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer,
        );
      } catch (e) {
        throw new CliError(`${file}: ${(e as Error).message}`);
      }
    });
    let merged;
    try {
      merged = mergeSampleSets(sets);
    } catch (e) {
      throw new CliError(`cannot merge these files: ${(e as Error).message}`);
    }
    const result = summarizeSamples(merged);
    const particleSteps = merged.counters.particleSteps;
    const files = {
      ...resultFiles(result, {
        performance: { wallSeconds: NaN, particleSteps, particleStepsPerSecond: NaN },
        caseName: merged.plan.caseData.name,
        plan: merged.plan,
      }),
      'case.json': `${prettyJson(merged.plan.caseData)}\n`,
    };
    writeResultsAtomically(values.out, files);
    for (const w of result.warnings) io.stderr.write(`warning: ${w}\n`);
    if (!values.quiet)
      io.stderr.write(
        `merged ${sets.length} file(s), ${merged.replicas} replica(s), ${merged.counters.sampledSteps} sampled steps: results in ${values.out}\n`,
      );
    return EXIT_OK;
  },
});
