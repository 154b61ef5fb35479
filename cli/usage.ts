/** Usage texts of the `tenuis` command and its subcommands. */

export const PRESET_USAGE = `Usage:
  tenuis preset --list                      list the presets
  tenuis preset NAME [--set key=value ...]  print the complete case file of a preset (JSON, SI units)
  tenuis preset NAME --help                 the preset's parameters with units and defaults

Values may carry units: --set gap=2mm --set temperature=25C --set knudsen=0.5`;

export const RUN_USAGE = `Usage:
  tenuis run CASE.json --out DIR [--seed N] [--replicas N] [--save-samples FILE]
             [--target Q=F] [--max-steps N] [--max-seconds S] [--checkpoint FILE] [--quiet]
  tenuis run --resume FILE --out DIR [--checkpoint FILE] [--quiet]

Runs the case and writes summary.json, profiles.csv, fields.csv, surfaces.csv and case.json (the case as run,
complete and explicit) into DIR. The files appear only when the run has ended: an error leaves DIR as it was;
Ctrl-C stops the run and writes what was sampled so far (exit code 130).
  --out, -o DIR         output folder (created if needed; files of the same names in it are replaced)
  --seed N              random seed, overriding the case's
  --replicas, -r N      N independent replicas on N worker threads (one per core), merged into one result;
                        replicas.json lists each replica's status and its own wall estimates.
  --save-samples FILE   also write the raw batch sums as a sample file, for tenuis merge
  --target Q=F          stop when quantity Q's 95 % half-width is within fraction F of its mean, e.g.
                        walls.top.shearStress=0.01 (or =1%); the progress line shows the precision reached and the
                        estimated time to the target. Without --max-steps, sampling may run to 50 × the case's
                        sampleSteps per replica.
  --max-steps N         sampling steps per replica (overrides the case's sampleSteps)
  --max-seconds S       stop sampling after S seconds of wall time
  --checkpoint FILE     keep a checkpoint of the whole run in FILE (every --checkpoint-every N steps, by default
                        every twentieth of the run, and on Ctrl-C); single replica only
  --resume FILE         continue a checkpointed run (no case file): the result is exactly that of an
                        uninterrupted run
  --quiet, -q           no progress line and no summary (warnings and errors are still printed)`;

export const MERGE_USAGE = `Usage:
  tenuis merge FILE... --out DIR [--quiet]

Combines sample files written by tenuis run --save-samples (replicas of one case, e.g. run on many machines with
different seeds) into one result with error bars from all of them, written into DIR like tenuis run does.`;

export const CHECK_USAGE = `Usage:
  tenuis check CASE.json

Validates the case and plans it: prints the reference state, grid, time step, particles and the advisor's ratios.
Exit code 0 when the case is valid and can run, 1 otherwise.`;

export const SCHEMA_USAGE = `Usage:
  tenuis schema

Prints the JSON Schema (draft 2020-12) of the case file.`;

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

export const SWEEP_USAGE = `Usage:
  tenuis sweep CASE.json --param knudsen|pressure --from A --to B --points N [--log] --out DIR
               [--replicas R] [--seed S] [--quiet]

Runs the case at N values of a parameter from A to B and writes DIR/sweep.csv (per point: the swept value, the
reference Knudsen number, rarefaction δ and pressure, and every flow quantity with its 95 % half-width — or, for
cases without flow sections, each wall's shear stress and heat flux; units in every header), DIR/sweep.json (every
point's summary) and each point's full result in DIR/points/NNN/ (as tenuis run writes it). A point changes only the
pressures: all of them are scaled by the same factor (Kn ∝ 1/p at fixed temperature and geometry), so pressure
ratios are kept. Cells and time step the case leaves unset are planned again for each point; those it fixes are kept
(the planner's warnings then say when cells grow beyond the mean free path). Every point is planned before anything
runs; Ctrl-C stops the running point, keeps what it sampled and writes the table so far, marked interrupted (exit 130).
  --param knudsen|pressure  knudsen: the case's reference Knudsen number; pressure: its reference (initial) pressure
  --from A, --to B          the ends of the range, above 0; pressures may carry a unit (10Pa, 0.1mbar, 1Torr)
  --points N                a whole number from 1 to 999 (1: just A)
  --log                     geometric spacing (equal ratios) instead of equal steps
  --out, -o DIR             output folder (created if needed; files of the same names in it are replaced)
  --replicas, -r R          R replicas per point on R worker threads, merged (as tenuis run --replicas)
  --seed S                  random seed of every point, overriding the case's
  --quiet, -q               no progress lines (warnings and errors are still printed)`;

export const MAIN_USAGE = `tenuis: rarefied gas flows by direct simulation Monte Carlo, from the command line

Usage:
  tenuis preset NAME [--set key=value ...]   print a case file built from a preset (--list, NAME --help)
  tenuis check CASE.json                     validate a case and show its plan
  tenuis run CASE.json --out DIR [--seed N] [--replicas N] [--save-samples FILE] [--quiet]
                                             run a case and write the results into DIR
  tenuis merge FILE... --out DIR             merge saved sample files of one case into one result
  tenuis sweep CASE.json --param knudsen --from A --to B --points N [--log] --out DIR
                                             run a case over a range of Knudsen numbers or pressures
  tenuis schema                              print the case file's JSON Schema
  tenuis continuum cavity --reynolds R --out DIR   steady Navier–Stokes lid-driven cavity (no-slip or slip walls)
  tenuis help [COMMAND]                      this text, or a command's

Case files are JSON with SI units; the field names carry the unit (pressurePa, lengthYM).
Exit codes: 0 success, 1 bad input, 2 wrong usage, 130 interrupted.`;

export const COMMAND_USAGE: Readonly<Record<string, string>> = {
  preset: PRESET_USAGE,
  run: RUN_USAGE,
  merge: MERGE_USAGE,
  sweep: SWEEP_USAGE,
  check: CHECK_USAGE,
  schema: SCHEMA_USAGE,
  continuum: CONTINUUM_USAGE,
};
