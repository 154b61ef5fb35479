/**
 * `tenuis continuum cavity --reynolds R --grid N --out DIR`: the steady lid-driven cavity by the continuum
 * (Navier–Stokes) solver of engine/continuum/cavity, with no-slip or first-order slip walls, for comparison with
 * particle runs and published tables. Every option is checked (by the engine's own rules, named here by their
 * command-line spelling) before anything is solved or created; the two result files appear together or not at all.
 */
import { solveCavity, type CavityResult } from '../../engine/continuum/cavity/solveCavity';
import {
  cavityOptionProblems,
  type CavityOptions,
  type CavitySlipModel,
} from '../../engine/continuum/cavity/cavityOptions';
import { csvDocument } from '../../engine/report/csv';
import { CliError, UsageError, EXIT_OK } from '../errors';
import { checkOutputDir, writeResultsAtomically } from '../writeResults';
import { duration, sig } from '../format';
import { prettyJson } from '../prettyJson';
import { defineCommand } from '../command';

export const CONTINUUM_USAGE = `Usage:
  tenuis continuum cavity --reynolds R [--grid N] [--slip none|first --knudsen K [--accommodation S]] --out DIR
                          [--tolerance T] [--max-iterations N] [--pseudo-time-step D] [--quiet]

Solves the steady incompressible Navier–Stokes equations for the lid-driven unit square cavity (lid at y = 1 moving
in +x) and writes centerlines.csv (u on x = 0.5 against y, v on y = 0.5 against x) and summary.json (iterations,
residual, centreline extrema) into DIR. Dimensionless: lengths in cavity sides, velocities in lid speeds.
  --reynolds R          Reynolds number U·L/ν, above 0
  --grid N              grid points per side, at least 9 (default 129; 33, 65, 129, 257 … solve fastest)
  --slip none|first     no-slip walls (default) or first-order Maxwell slip u_s − u_w = ((2−σ)/σ)·Kn·∂u/∂n on all walls
  --knudsen K           Kn = λ/L with the viscosity-based mean free path, at least 0 (with --slip first)
  --accommodation S     tangential momentum accommodation σ of the walls, above 0 and at most 1 (default 1)
  --tolerance T         residual to stop at (default 1e-10: the largest point-relaxation change left in ω and ψ)
  --max-iterations N    pseudo-time steps at most (default 20000)
  --pseudo-time-step D  pseudo-time step in L/U (default min(Re·h/8, 25h), h = 1/(N−1))
  --out, -o DIR         output folder (created if needed; files of the same names in it are replaced)
  --quiet, -q           no summary line`;

const PROBLEMS = ['cavity'] as const;

/** Command-line spelling of each solver option, for messages. */
const OPTION_NAMES: Readonly<Record<keyof CavityOptions, string>> = {
  reynolds: '--reynolds',
  grid: '--grid',
  slip: '--slip',
  knudsen: '--knudsen',
  accommodation: '--accommodation',
  tolerance: '--tolerance',
  maxIterations: '--max-iterations',
  pseudoTimeStep: '--pseudo-time-step',
};

/** A number given on the command line; a text that is not a number stays NaN so the range check names it. */
function numberOption(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  return text.trim() === '' ? Number.NaN : Number(text);
}

/**
 * `--knudsen -1` as `--knudsen=-1`: parseArgs refuses a value that starts with a dash, but a negative number given to
 * a numeric option should reach the range check and get its message (what is allowed), not a parser complaint.
 */
function joinNegativeValues(args: readonly string[]): string[] {
  const numeric = new Set(Object.values(OPTION_NAMES).filter((name) => name !== '--slip'));
  const out: string[] = [];
  for (let k = 0; k < args.length; k++) {
    if (numeric.has(args[k]) && k + 1 < args.length && /^-[\d.]/.test(args[k + 1])) out.push(`${args[k]}=${args[++k]}`);
    else out.push(args[k]);
  }
  return out;
}

const CONTINUUM_OPTIONS = {
  reynolds: { type: 'string' },
  grid: { type: 'string' },
  slip: { type: 'string' },
  knudsen: { type: 'string' },
  accommodation: { type: 'string' },
  tolerance: { type: 'string' },
  'max-iterations': { type: 'string' },
  'pseudo-time-step': { type: 'string' },
  out: { type: 'string', short: 'o' },
  quiet: { type: 'boolean', short: 'q' },
} as const;

export const continuumCommand = defineCommand({
  name: 'continuum',
  summary:
    '  tenuis continuum cavity --reynolds R --out DIR   steady Navier–Stokes lid-driven cavity (no-slip or slip walls)',
  usage: CONTINUUM_USAGE,
  options: CONTINUUM_OPTIONS,
  prepareArgs: joinNegativeValues,
  run: ({ values, positionals }, { io }) => {
    const [problem, ...extra] = positionals;
    if (problem === undefined)
      throw new UsageError(`continuum needs a problem: ${PROBLEMS.join(', ')}`, CONTINUUM_USAGE);
    if (problem !== 'cavity')
      throw new UsageError(
        `unknown continuum problem "${problem}": give one of ${PROBLEMS.join(', ')}`,
        CONTINUUM_USAGE,
      );
    if (extra.length > 0) throw new UsageError(`unexpected argument "${extra[0]}"`, CONTINUUM_USAGE);
    if (values.reynolds === undefined)
      throw new UsageError('continuum cavity needs --reynolds R (a number above 0)', CONTINUUM_USAGE);
    if (!values.out) throw new UsageError('continuum cavity needs an output folder: --out DIR', CONTINUUM_USAGE);

    const options: CavityOptions = {
      reynolds: numberOption(values.reynolds) as number,
      grid: numberOption(values.grid) ?? 129,
      slip: values.slip as CavitySlipModel | undefined,
      knudsen: numberOption(values.knudsen),
      accommodation: numberOption(values.accommodation),
      tolerance: numberOption(values.tolerance),
      maxIterations: numberOption(values['max-iterations']),
      pseudoTimeStep: numberOption(values['pseudo-time-step']),
    };
    const problems = cavityOptionProblems(options);
    if (problems.length > 0) {
      const given = (field: keyof CavityOptions): string => {
        const text = (values as Record<string, unknown>)[OPTION_NAMES[field].slice(2)];
        return typeof text === 'string' ? ` ${text}` : '';
      };
      const lines = problems.map(
        (p) => `${OPTION_NAMES[p.field]}${given(p.field)}: ${p.allowed.replace('slip "first"', '--slip first')}`,
      );
      throw new UsageError(lines.join('\n'), CONTINUUM_USAGE);
    }
    checkOutputDir(values.out);

    const started = performance.now();
    const result = solveCavity(options);
    const seconds = (performance.now() - started) / 1000;
    if (!result.converged) {
      throw new CliError(
        `cavity did not converge: residual ${sig(result.residual)} after ${result.iterations} pseudo-time steps ` +
          `(tolerance ${sig(options.tolerance ?? 1e-10)}); nothing was written. Try a larger --max-iterations, a finer ` +
          '--grid (a coarse grid at high Re may have no smooth steady solution) or a smaller --pseudo-time-step.',
      );
    }
    writeResultsAtomically(values.out, cavityFiles(result));
    if (!values.quiet) {
      const c = result.centerline;
      io.stderr.write(
        `cavity Re = ${result.reynolds} on ${result.grid}×${result.grid}: converged in ${result.iterations} pseudo-time steps ` +
          `(residual ${sig(result.residual, 2)}, ${duration(seconds)}); uMin ${sig(c.uMin.value)} at y = ${sig(c.uMin.y)}, ` +
          `vMax ${sig(c.vMax.value)} at x = ${sig(c.vMax.x)}, vMin ${sig(c.vMin.value)} at x = ${sig(c.vMin.x)}; results in ${values.out}\n`,
      );
    }
    return EXIT_OK;
  },
});

/**
 * centerlines.csv (u on x = 1/2 against y, v on y = 1/2 against x, one row per grid point; both lines share the
 * grid positions) and summary.json, dimensionless: lengths in sides, velocities in lid speeds. Deterministic (no
 * timings), so two runs of the same options write identical files.
 */
export function cavityFiles(r: CavityResult): Record<string, string> {
  const c = r.centerline;
  const rows: number[][] = [];
  for (let k = 0; k < c.position.length; k++) rows.push([c.position[k], c.u[k], c.position[k], c.v[k]]);
  const summary = {
    problem: 'lid-driven cavity',
    units: { length: 'side', velocity: 'lid speed' },
    reynolds: r.reynolds,
    grid: r.grid,
    slip: r.slip,
    iterations: r.iterations,
    residual: r.residual,
    converged: r.converged,
    pseudoTimeStep: r.pseudoTimeStep,
    centerline: { uMin: c.uMin, vMax: c.vMax, vMin: c.vMin },
  };
  return {
    'centerlines.csv': csvDocument(['y [side]', 'u [lid speed]', 'x [side]', 'v [lid speed]'], rows),
    'summary.json': `${prettyJson(summary)}\n`,
  };
}
