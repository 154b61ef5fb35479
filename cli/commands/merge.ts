/**
 * `tenuis merge FILE... --out DIR`: combines sample files (tenuis run --save-samples) of replicas of one case into
 * one result, as if they had run together. Files are read as bytes and decoded by the versioned sample-file reader,
 * which refuses damaged files and files of different cases with a message naming the file and the problem.
 */
import { parseArgs } from 'node:util';
import { readFileSync } from 'node:fs';
import { decodeSampleSet } from '../../engine/io/sampleFile';
import { mergeSampleSets } from '../../engine/results/mergeSamples';
import { summarizeSamples } from '../../engine/results/summarize';
import { resultFiles } from '../../engine/report/resultFiles';
import { UsageError, CliError, EXIT_OK } from '../errors';
import { MERGE_USAGE } from '../usage';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { prettyJson } from '../prettyJson';
import type { CommandIO } from './io';

export function mergeCommand(args: string[], io: CommandIO): number {
  let parsed;
  try {
    parsed = parseArgs({
      args,
      allowPositionals: true,
      options: {
        out: { type: 'string', short: 'o' },
        quiet: { type: 'boolean', short: 'q' },
        help: { type: 'boolean', short: 'h' },
      },
    });
  } catch (e) {
    throw new UsageError((e as Error).message, MERGE_USAGE);
  }
  const { values, positionals } = parsed;
  if (values.help) {
    io.stdout.write(`${MERGE_USAGE}\n`);
    return EXIT_OK;
  }
  if (positionals.length === 0) throw new UsageError('merge needs at least one sample file', MERGE_USAGE);
  if (!values.out) throw new UsageError('merge needs an output folder: --out DIR', MERGE_USAGE);
  checkOutputDir(values.out);
  const sets = positionals.map((file) => {
    let bytes: Buffer;
    try {
      bytes = readFileSync(file);
    } catch (e) {
      throw new CliError(`${file}: cannot read it (${(e as NodeJS.ErrnoException).code ?? (e as Error).message})`);
    }
    try {
      return decodeSampleSet(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
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
}
