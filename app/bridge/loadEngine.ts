/**
 * Loads the engine's main-thread parts lazily, each into a chunk of its own: the set-up API (presets, validation,
 * planner) and the run API (worker pool, merging, summaries, exports). Each chunk is taken as the interface it
 * promises (types.ts), so the type check fails here if a chunk stops providing a member. Everything else in app/
 * imports the chunks' types only, so the engine never lands in the main bundle.
 */
import type { LongDuctApi, RunApi, SetupApi } from './types';

let setup: SetupApi | null = null;
let setupLoading: Promise<SetupApi> | null = null;
let runLoading: Promise<RunApi> | null = null;

export function loadSetupApi(): Promise<SetupApi> {
  setupLoading ??= import('./setupApi').then((m: SetupApi) => (setup = m));
  return setupLoading;
}

/** The set-up API once loaded (the app renders its forms only after loadSetupApi() resolved). */
export function setupApi(): SetupApi {
  if (!setup) throw new Error('the set-up part of the engine is not loaded yet');
  return setup;
}

let run: RunApi | null = null;

export function loadRunApi(): Promise<RunApi> {
  runLoading ??= import('./runApi').then((m: RunApi) => (run = m));
  return runLoading;
}

/** The run API if it has been loaded (it always has once a result exists), else null. */
export function runApiIfLoaded(): RunApi | null {
  return run;
}

let longDuctLoading: Promise<LongDuctApi> | null = null;

/** The long-duct chunk (the Long duct view loads it when first shown). */
export function loadLongDuctApi(): Promise<LongDuctApi> {
  longDuctLoading ??= import('./longDuctApi').then((m: LongDuctApi) => m);
  return longDuctLoading;
}
