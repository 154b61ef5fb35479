/**
 * Checkpoints: one replica's whole dynamic state — particles, random stream, collision bookkeeping and every
 * accumulated sample — as one versioned ArrayBuffer, so a long run can be stopped and resumed to give exactly the
 * result it would have given uninterrupted (tests/unit/checkpoint.test.ts checks bit-for-bit equality).
 *
 * The framing is the binary container's (binaryContainer.ts), with the magic 0x89 'T' 'N' 'C' 0x0D 0x0A 0x1A 0x0A
 * (C: checkpoint; sample files end in S) and format version 2. Version 1 had the same preamble but a directory of
 * its own with uint32 arrays; it is refused with a message. The header (JSON) holds the case, the stream, the
 * scalars, the batch stores' shapes and the series keys; every array is float64, the generator's uint32 state
 * included (each value exact in a double).
 *
 * What is not saved is rebuilt: the plan (from the case), the cell index and sort order (recomputed by the next
 * step's move and index), scratch buffers. Pure: no Node or DOM API.
 */
import { planFromInput } from '../plan/plan';
import { createSimulation, type Simulation } from '../run/simulation';
import { createSeries } from '../stats/series';
import { replayTransientMonitor, MONITOR_NAMES } from '../run/transientMonitor';
import { growParticles } from '../kernel/particleStore';
import {
  encodeContainer,
  decodeContainerHeader,
  containerDirectoryOf,
  readContainerArrays,
  containerError,
  type ContainerFormat,
} from './binaryContainer';
import { SAMPLE_FILE_MAGIC } from './sampleFile';

export const CHECKPOINT_MAGIC = Uint8Array.of(0x89, 0x54, 0x4e, 0x43, 0x0d, 0x0a, 0x1a, 0x0a);
export const CHECKPOINT_VERSION = 2;
const CHECKPOINT_FORMAT = 'tenuis-checkpoint';
const CHECKPOINT: ContainerFormat = {
  what: 'checkpoint',
  magic: CHECKPOINT_MAGIC,
  version: CHECKPOINT_VERSION,
  olderVersionAdvice: 'it was written by an earlier Tenuis and cannot be resumed by this one; start the run again',
};

interface CheckpointHeader {
  format: typeof CHECKPOINT_FORMAT;
  caseData: unknown;
  stream: number;
  scalars: Record<string, number>;
  stores: Record<'cellStore' | 'wallStore', { batches: number; batchLength: number; pendingLength: number }>;
  seriesKeys: string[];
}

/** The state's scalars that a step reads or accumulates. */
const STATE_SCALARS = [
  'count',
  'step',
  'collisionCount',
  'candidateCount',
  'separationSum',
  'particleSteps',
  'cellSumSteps',
  'leaks',
] as const;

/** The simulation at this moment as a checkpoint (a fresh ArrayBuffer). `stream` is the replica's random stream. */
export function encodeCheckpoint(sim: Simulation, stream: number): ArrayBuffer {
  const st = sim.state;
  const n = st.count;
  const arrays: [string, Float64Array][] = [
    ['x', st.x.subarray(0, n)],
    ['y', st.y.subarray(0, n)],
    ['vx', st.vx.subarray(0, n)],
    ['vy', st.vy.subarray(0, n)],
    ['vz', st.vz.subarray(0, n)],
    ['erot', st.erot.subarray(0, n)],
    ['rng', Float64Array.from(st.rng)],
    ['sigmaCrMax', st.sigmaCrMax],
    ['collisionRemainder', st.collisionRemainder],
    ['cellSums', st.cellSums],
    ['wallSums', st.wallSums],
    ['sectionSums', st.sectionSums],
    ['inflowRemainder', st.inflowRemainder],
    ['weightCarry', st.weightCarry],
    ['inflowTable', st.inflowTable],
    ['outletMoments', st.outletMoments],
    ['cellStore.values', sim.cellStore.values],
    ['cellStore.pending', sim.cellStore.pending],
    ['wallStore.values', sim.wallStore.values],
    ['wallStore.pending', sim.wallStore.pending],
  ];
  // The transient monitor's samples, 5 per row: replaying them rebuilds its detector exactly.
  arrays.push(['monitorHistory', Float64Array.from((sim.monitor?.history ?? []).flat())]);
  const seriesKeys = [...sim.series.keys()];
  for (const k of seriesKeys) {
    const s = sim.series.get(k)!;
    arrays.push([`series/${k}`, s.values.subarray(0, s.length)]);
  }
  const scalars: Record<string, number> = { batchStepsDone: sim.batchStepsDone, sampledSteps: sim.sampledSteps };
  for (const k of STATE_SCALARS) scalars[k] = st[k];
  scalars.sampling = st.sampling ? 1 : 0;
  scalars.transientEndStep = Number.isFinite(sim.transientEndStep) ? sim.transientEndStep : -1;
  const store = (s: Simulation['cellStore']) => ({
    batches: s.batches,
    batchLength: s.batchLength,
    pendingLength: s.pendingLength,
  });
  const header: CheckpointHeader = {
    format: CHECKPOINT_FORMAT,
    caseData: sim.plan.caseData,
    stream,
    scalars,
    stores: { cellStore: store(sim.cellStore), wallStore: store(sim.wallStore) },
    seriesKeys,
  };
  return encodeContainer(CHECKPOINT, header, arrays);
}

function fail(message: string): never {
  containerError(CHECKPOINT, message);
}

/** Rebuilds the simulation from a checkpoint; the next advance() continues exactly where it stopped. */
export function decodeCheckpoint(buffer: ArrayBuffer): { sim: Simulation; stream: number } {
  const bytes = new Uint8Array(buffer);
  if (bytes.length >= 8 && SAMPLE_FILE_MAGIC.every((b, i) => bytes[i] === b))
    fail('this is a sample file (the samples of a finished or saved run), not a checkpoint; it cannot be resumed');
  const decoded = decodeContainerHeader(buffer, CHECKPOINT);
  const header = decoded.header as CheckpointHeader;
  if (header?.format !== CHECKPOINT_FORMAT) fail('the header is not a checkpoint header');
  const arrays = readContainerArrays(buffer, containerDirectoryOf(header, CHECKPOINT), decoded.dataStart, CHECKPOINT);
  const planned = planFromInput(header.caseData);
  if (!planned.ok) fail(`its case is no longer valid:\n${planned.errors.join('\n')}`);
  const read = (name: string): Float64Array => arrays.get(name) ?? fail(`array ${name} is missing`);
  const into = (target: Float64Array | Uint32Array, name: string) => {
    const a = read(name);
    if (a.length !== target.length) fail(`array ${name} has ${a.length} values, the case needs ${target.length}`);
    target.set(a);
  };

  const sim = createSimulation(planned.plan, { stream: header.stream });
  const st = sim.state;
  const n = header.scalars.count;
  if (n > st.capacity) growParticles(st, Math.max(n, 2 * st.capacity));
  for (const name of ['x', 'y', 'vx', 'vy', 'vz', 'erot'] as const) {
    const a = read(name);
    if (a.length !== n) fail(`array ${name} has ${a.length} values for ${n} particles`);
    st[name].set(a);
  }
  st.count = n;
  into(st.rng, 'rng');
  into(st.sigmaCrMax, 'sigmaCrMax');
  into(st.collisionRemainder, 'collisionRemainder');
  into(st.cellSums, 'cellSums');
  into(st.wallSums, 'wallSums');
  into(st.sectionSums, 'sectionSums');
  into(st.inflowRemainder, 'inflowRemainder');
  into(st.weightCarry, 'weightCarry');
  into(st.inflowTable, 'inflowTable');
  into(st.outletMoments, 'outletMoments');
  for (const k of STATE_SCALARS) if (k !== 'count') st[k] = header.scalars[k] ?? 0;
  st.sampling = header.scalars.sampling === 1;
  sim.batchStepsDone = header.scalars.batchStepsDone;
  sim.transientEndStep = header.scalars.transientEndStep < 0 ? Infinity : header.scalars.transientEndStep;
  if (sim.monitor) {
    const flat = read('monitorHistory');
    const width = MONITOR_NAMES.length;
    const rows: number[][] = [];
    for (let i = 0; i + width <= flat.length; i += width) rows.push(Array.from(flat.subarray(i, i + width)));
    sim.monitor = replayTransientMonitor(planned.plan.transientSteps, rows);
  }
  sim.sampledSteps = header.scalars.sampledSteps;
  for (const which of ['cellStore', 'wallStore'] as const) {
    const store = sim[which];
    into(store.values, `${which}.values`);
    into(store.pending, `${which}.pending`);
    Object.assign(store, header.stores[which]);
  }
  for (const key of header.seriesKeys) {
    const values = read(`series/${key}`);
    const s = createSeries(Math.max(256, values.length));
    s.values.set(values);
    s.length = values.length;
    sim.series.set(key, s);
  }
  return { sim, stream: header.stream };
}
