/** `tenuis preset`: print a preset's complete case file, its help, or the list of presets. */
import { buildPreset, presetHelp, presetNames, PRESETS } from '../../engine/case/presets';
import { parseCase } from '../../engine/case/schema';
import { plan } from '../../engine/plan/plan';
import { CliError, UsageError, EXIT_OK } from '../errors';
import { prettyJson } from '../prettyJson';
import { defineCommand } from '../command';

export const PRESET_USAGE = `Usage:
  tenuis preset --list                      list the presets
  tenuis preset NAME [--set key=value ...]  print the complete case file of a preset (JSON, SI units)
  tenuis preset NAME --help                 the preset's parameters with units and defaults

Values may carry units: --set gap=2mm --set temperature=25C --set knudsen=0.5`;

function presetList(): string {
  const names = presetNames();
  const width = Math.max(...names.map((n) => n.length));
  return names.map((n) => `  ${n.padEnd(width)}  ${PRESETS[n].description}`).join('\n');
}

/** ['gap=2mm', 'knudsen=1'] → { gap: '2mm', knudsen: '1' } (a later --set of the same key wins). */
export function parseSetOptions(settings: readonly string[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const s of settings) {
    const eq = s.indexOf('=');
    if (eq <= 0) throw new UsageError(`--set expects key=value (e.g. --set gap=2mm), not "${s}"`, PRESET_USAGE);
    out[s.slice(0, eq).trim()] = s.slice(eq + 1);
  }
  return out;
}

export const presetCommand = defineCommand({
  name: 'preset',
  summary: '  tenuis preset NAME [--set key=value ...]   print a case file built from a preset (--list, NAME --help)',
  usage: PRESET_USAGE,
  options: { set: { type: 'string', short: 's', multiple: true }, list: { type: 'boolean', short: 'l' } },
  // `preset --help` lists the presets too, and `preset NAME --help` is the preset's own help.
  ownHelp: true,
  run({ values, positionals }, { io }) {
    if (values.list) {
      io.stdout.write(`${presetList()}\n`);
      return EXIT_OK;
    }
    if (positionals.length === 0) {
      if (values.help) {
        io.stdout.write(`${PRESET_USAGE}\n\nPresets:\n${presetList()}\n`);
        return EXIT_OK;
      }
      throw new UsageError(`which preset? Presets:\n${presetList()}`, PRESET_USAGE);
    }
    if (positionals.length > 1)
      throw new UsageError(`one preset name expected, got ${positionals.join(' ')}`, PRESET_USAGE);
    const name = positionals[0];
    let caseInput;
    try {
      if (values.help) {
        io.stdout.write(`${presetHelp(name)}\n`);
        return EXIT_OK;
      }
      caseInput = buildPreset(name, parseSetOptions(values.set ?? []));
    } catch (e) {
      if (e instanceof CliError) throw e;
      throw new CliError((e as Error).message);
    }
    const parsedCase = parseCase(caseInput);
    if (!parsedCase.ok)
      throw new CliError(`preset ${name} gave an invalid case:\n${parsedCase.errors.map((m) => `  ${m}`).join('\n')}`);
    const planned = plan(parsedCase.value);
    if (!planned.ok) {
      io.stderr.write(
        `warning: \`tenuis check\` will reject this case as it stands:\n${planned.errors.map((m) => `  ${m}`).join('\n')}\n`,
      );
    } else {
      for (const w of planned.plan.warnings) io.stderr.write(`warning: ${w}\n`);
    }
    io.stdout.write(`${prettyJson(parsedCase.value)}\n`);
    return EXIT_OK;
  },
});
