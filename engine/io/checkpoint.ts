/**
 * Checkpoints: one replica's whole dynamic state — particles, random stream, collision bookkeeping and every
 * accumulated sample — as one versioned ArrayBuffer, so a long run can be stopped and resumed to give exactly the
 * result it would have given uninterrupted (tests/unit/checkpoint.test.ts checks bit-for-bit equality).
 *
 *   0   8 bytes  magic 0x89 'T' 'N' 'C' 0x0D 0x0A 0x1A 0x0A   (C: checkpoint; sample files end in S)
 *   8   uint32   format version (little-endian)
 *   12  uint32   header length H
 *   16  H bytes  UTF-8 JSON header: case, stream, scalars, array directory (name, dtype, offset, length)
 *   …   zero padding to a multiple of 8, then the arrays (little-endian), each 8-byte aligned
 *
 * What is not saved is rebuilt: the plan (from the case), the cell index and sort order (recomputed by the next
 * step's move and index), scratch buffers. Pure: no Node or DOM API.
 */
import { planFromInput } from '../plan/plan';
import { createSimulation, type Simulation } from '../run/simulation';
import { createSeries } from '../stats/series';
import { replayTransientMonitor, MONITOR_NAMES } from '../run/transientMonitor';
import { TextEncoder, TextDecoder } from './utf8';
import { growParticles } from '../kernel/particleStore';

export const CHECKPOINT_MAGIC = Uint8Array.of(0x89, 0x54, 0x4e, 0x43, 0x0d, 0x0a, 0x1a, 0x0a);
export const CHECKPOINT_VERSION = 1;

type Dtype = 'f64' | 'u32';
interface ArrayEntry {
  name: string;
  dtype: Dtype;
  offset: number;
  length: number;
}
interface CheckpointHeader {
  format: 'tenuis-checkpoint';
  caseData: unknown;
  stream: number;
  scalars: Record<string, number>;
  stores: Record<'cellStore' | 'wallStore', { batches: number; batchLength: number; pendingLength: number }>;
  seriesKeys: string[];
  arrays: ArrayEntry[];
}

const align8 = (n: number) => Math.ceil(n / 8) * 8;
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
  const arrays: [string, Float64Array | Uint32Array][] = [
    ['x', st.x.subarray(0, n)],
    ['y', st.y.subarray(0, n)],
    ['vx', st.vx.subarray(0, n)],
    ['vy', st.vy.subarray(0, n)],
    ['vz', st.vz.subarray(0, n)],
    ['erot', st.erot.subarray(0, n)],
    ['rng', st.rng],
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
  let offset = 0;
  const directory: ArrayEntry[] = arrays.map(([name, a]) => {
    const e: ArrayEntry = { name, dtype: a instanceof Uint32Array ? 'u32' : 'f64', offset, length: a.length };
    offset = align8(offset + a.byteLength);
    return e;
  });
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
    format: 'tenuis-checkpoint',
    caseData: sim.plan.caseData,
    stream,
    scalars,
    stores: { cellStore: store(sim.cellStore), wallStore: store(sim.wallStore) },
    seriesKeys,
    arrays: directory,
  };
  const headerBytes = new TextEncoder().encode(JSON.stringify(header));
  const dataStart = align8(16 + headerBytes.length);
  const buffer = new ArrayBuffer(dataStart + offset);
  const bytes = new Uint8Array(buffer);
  bytes.set(CHECKPOINT_MAGIC, 0);
  const view = new DataView(buffer);
  view.setUint32(8, CHECKPOINT_VERSION, true);
  view.setUint32(12, headerBytes.length, true);
  bytes.set(headerBytes, 16);
  arrays.forEach(([, a], k) => {
    const at = dataStart + directory[k].offset;
    if (a instanceof Uint32Array) for (let i = 0; i < a.length; i++) view.setUint32(at + 4 * i, a[i], true);
    else for (let i = 0; i < a.length; i++) view.setFloat64(at + 8 * i, a[i], true);
  });
  return buffer;
}

function fail(message: string): never {
  throw new Error(`checkpoint: ${message}`);
}

/** Rebuilds the simulation from a checkpoint; the next advance() continues exactly where it stopped. */
export function decodeCheckpoint(buffer: ArrayBuffer): { sim: Simulation; stream: number } {
  const bytes = new Uint8Array(buffer);
  if (bytes.length < 16 || CHECKPOINT_MAGIC.some((b, i) => bytes[i] !== b))
    fail('not a checkpoint file (wrong magic bytes)');
  const view = new DataView(buffer);
  const version = view.getUint32(8, true);
  if (version !== CHECKPOINT_VERSION)
    fail(`format version ${version} is not supported (this build reads version ${CHECKPOINT_VERSION})`);
  const headerLength = view.getUint32(12, true);
  if (16 + headerLength > bytes.length) fail('truncated: the header runs past the end of the file');
  let header: CheckpointHeader;
  try {
    header = JSON.parse(new TextDecoder('utf-8', { fatal: true }).decode(bytes.subarray(16, 16 + headerLength)));
  } catch (e) {
    fail(`the header is damaged (${(e as Error).message})`);
  }
  if (header.format !== 'tenuis-checkpoint') fail('the header is not a checkpoint header');
  const planned = planFromInput(header.caseData);
  if (!planned.ok) fail(`its case is no longer valid:\n${planned.errors.join('\n')}`);
  const dataStart = align8(16 + headerLength);
  const read = (name: string): Float64Array | Uint32Array => {
    const e = header.arrays.find((a) => a.name === name) ?? fail(`array ${name} is missing`);
    const size = e.dtype === 'u32' ? 4 : 8;
    const at = dataStart + e.offset;
    if (at + e.length * size > bytes.length) fail(`truncated: array ${name} runs past the end of the file`);
    const out = e.dtype === 'u32' ? new Uint32Array(e.length) : new Float64Array(e.length);
    for (let i = 0; i < e.length; i++)
      out[i] = e.dtype === 'u32' ? view.getUint32(at + 4 * i, true) : view.getFloat64(at + 8 * i, true);
    return out;
  };
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
    const values = read(`series/${key}`) as Float64Array;
    const s = createSeries(Math.max(256, values.length));
    s.values.set(values);
    s.length = values.length;
    sim.series.set(key, s);
  }
  return { sim, stream: header.stream };
}
