/**
 * Sample files: a SampleSet as one portable, versioned ArrayBuffer, so runs on many machines (or worker threads) can
 * be saved and merged later. Pure: bytes in, bytes out; the format is documented field by field in DEVELOPERS.md,
 * "Sample files". The framing (magic 89 54 4E 53 0D 0A 1A 0A, version, JSON header, aligned float64 arrays) is the
 * binary container's (binaryContainer.ts); the header and what the arrays hold are this module's.
 *
 * Reading a file from disk or another machine validates everything once and re-plans its case, so a file from
 * another version is refused with a message rather than misread. Buffers from replicas of a case the reader has
 * planned itself may be read against that plan instead (decodeSampleSet's `trusted`), skipping only the re-planning.
 */
import { parseCase } from '../case/schema';
import { plan as planCase } from '../plan/plan';
import { wallNamesOf } from '../kernel/sideTable';
import type { BatchList } from '../stats/batchList';
import { seriesKeysOf } from '../results/seriesKeys';
import { geometryOf, geometryDifferences, wallBinTotalOf } from '../kernel/samplingGeometry';
import type { SampleSet } from '../results/sampleSet';
import type { Plan } from '../plan/plan';
import { RAW_CELL_SUMS, SUMS_PER_WALL_BIN } from '../kernel/layout';
import {
  parseSampleFileHeader,
  SAMPLE_FILE_FORMAT,
  type SampleFileHeader,
  type BatchStoreHeader,
} from './sampleFileHeader';
import {
  encodeContainer,
  decodeContainerHeader,
  readContainerArrays,
  containerError,
  type ContainerFormat,
} from './binaryContainer';
import { sameJson } from './sameJson';

export const SAMPLE_FILE_MAGIC = Uint8Array.of(0x89, 0x54, 0x4e, 0x53, 0x0d, 0x0a, 0x1a, 0x0a);
export const SAMPLE_FILE_VERSION = 1;
const SAMPLE_FILE: ContainerFormat = { what: 'sample file', magic: SAMPLE_FILE_MAGIC, version: SAMPLE_FILE_VERSION };

function seriesArrayName(key: string, replica: number): string {
  return `series/${key}/${replica}`;
}

/** The named arrays of a set, in file order. */
function arraysOf(set: SampleSet): [string, Float64Array][] {
  const out: [string, Float64Array][] = [
    ['sideTable', set.geometry.sideTable],
    ['cellStore.values', set.cellStore.values],
    ['cellStore.pending', set.cellStore.pending],
    ['wallStore.values', set.wallStore.values],
    ['wallStore.pending', set.wallStore.pending],
    ['pendingCellSums', set.pendingCellSums],
    ['pendingWallSums', set.pendingWallSums],
  ];
  for (const [key, replicas] of set.series)
    replicas.forEach((values, r) => out.push([seriesArrayName(key, r), values]));
  return out;
}

function storeHeader(list: BatchList): BatchStoreHeader {
  const { width, unitSteps, batchLength, batches, pendingLength, segments } = list;
  return { width, unitSteps, batchLength, batches, pendingLength, segments: [...segments] };
}

/** A sample set as one sample file (a fresh ArrayBuffer, ready to transfer or write). */
export function encodeSampleSet(set: SampleSet): ArrayBuffer {
  const g = set.geometry;
  const p = set.plan;
  const header: Omit<SampleFileHeader, 'arrays'> = {
    format: SAMPLE_FILE_FORMAT,
    case: p.caseData,
    plan: {
      cellsX: p.grid.cellsX,
      cellsY: p.grid.cellsY,
      timeStepS: p.timeStepS,
      batchSteps: p.batchSteps,
      transientSteps: p.transientSteps,
      sampleSteps: p.sampleSteps,
      particlesPerCell: p.particlesPerCell,
      moleculesPerParticle: p.moleculesPerParticle,
    },
    geometry: {
      cells: g.cells,
      cellsX: g.cellsX,
      cellsY: g.cellsY,
      lengthX: g.lengthX,
      lengthY: g.lengthY,
      cellVolume: g.cellVolume,
      timeStep: g.timeStep,
      massKg: g.massKg,
      moleculesPerParticle: g.moleculesPerParticle,
      rotationalDof: g.rotationalDof,
      axisymmetric: g.axisymmetric,
    },
    wallNames: [...set.wallNames],
    replicas: set.replicas,
    seeds: [...set.seeds],
    counters: { ...set.counters },
    pendingSteps: set.pendingSteps,
    cellStore: storeHeader(set.cellStore),
    wallStore: storeHeader(set.wallStore),
  };
  return encodeContainer(SAMPLE_FILE, header, arraysOf(set));
}

function fail(message: string): never {
  containerError(SAMPLE_FILE, message);
}

/** The preamble and the header, validated; the start of the data block. */
function readHeader(buffer: ArrayBuffer): { header: SampleFileHeader; dataStart: number } {
  const { header, dataStart } = decodeContainerHeader(buffer, SAMPLE_FILE);
  const parsed = parseSampleFileHeader(header);
  if (!parsed.ok) fail(`the header is not valid:\n  ${parsed.errors.join('\n  ')}`);
  return { header: parsed.value, dataStart };
}

/** Each directory array as a Float64Array (copied out of the file), checked for bounds and finite values. */
function readArrays(buffer: ArrayBuffer, header: SampleFileHeader, dataStart: number): Map<string, Float64Array> {
  return readContainerArrays(buffer, header.arrays, dataStart, SAMPLE_FILE, (name, values) => {
    for (let i = 0; i < values.length; i++)
      if (!Number.isFinite(values[i]))
        fail(`array ${name} holds ${values[i]} at index ${i}; sample sums are always finite (damaged file?)`);
  });
}

/** The file's case validated and planned again, as for a file from disk. */
function planOfHeader(header: SampleFileHeader): Plan {
  const parsed = parseCase(header.case);
  if (!parsed.ok) fail(`its case is not valid:\n  ${parsed.errors.join('\n  ')}`);
  const planned = planCase(parsed.value);
  if (!planned.ok) fail(`its case cannot be planned:\n  ${planned.errors.join('\n  ')}`);
  return planned.plan;
}

/** The caller's plan, once the file's case is found to be that plan's case. */
function trustedPlan(header: SampleFileHeader, plan: Plan): Plan {
  const differs = sameJson(header.case, plan.caseData);
  if (differs !== null) fail(`its case is not the case of the plan given to read it (they differ at ${differs})`);
  return plan;
}

function arrayOf(arrays: Map<string, Float64Array>, name: string, length: number): Float64Array {
  const a = arrays.get(name);
  if (!a) fail(`array ${name} is missing`);
  if (a.length !== length) fail(`array ${name} has ${a.length} values; the header's shapes need ${length}`);
  return a;
}

function batchList(
  h: BatchStoreHeader,
  name: string,
  width: number,
  unitSteps: number,
  arrays: Map<string, Float64Array>,
): BatchList {
  if (h.width !== width) fail(`${name}.width is ${h.width}; the case needs ${width}`);
  if (h.unitSteps !== unitSteps)
    fail(`${name}.unitSteps is ${h.unitSteps}; the case's base batch is ${unitSteps} steps`);
  if (h.segments.reduce((s, n) => s + n, 0) !== h.batches)
    fail(`${name}.segments add up to ${h.segments.reduce((s, n) => s + n, 0)}, not to batches = ${h.batches}`);
  return {
    width,
    unitSteps,
    batchLength: h.batchLength,
    batches: h.batches,
    values: arrayOf(arrays, `${name}.values`, h.batches * width),
    pending: arrayOf(arrays, `${name}.pending`, width),
    pendingLength: h.pendingLength,
    segments: [...h.segments],
  };
}

/**
 * Reads a sample file back into a SampleSet. Throws an Error starting "sample file:" that says what is wrong: not a
 * sample file (wrong magic), a version this Tenuis does not read, a truncated file, a header or case that does not
 * validate, or samples that do not fit the case.
 *
 * `trusted.plan`: the plan of the file's case, already validated and planned by the caller (buffers from its own
 * replicas in memory). The file's case is then compared with the plan's instead of being validated and planned
 * again, the costly part of reading a small file; every other check stays, the geometry check against that plan
 * included. Files from disk or from elsewhere are read without it.
 */
export function decodeSampleSet(buffer: ArrayBuffer, trusted?: { readonly plan: Plan }): SampleSet {
  const { header, dataStart } = readHeader(buffer);
  const plan = trusted ? trustedPlan(header, trusted.plan) : planOfHeader(header);
  const arrays = readArrays(buffer, header, dataStart);

  const geometry = geometryOf(plan);
  const stored = { ...header.geometry, sideTable: arrayOf(arrays, 'sideTable', geometry.sideTable.length) };
  const differs = geometryDifferences(stored, geometry);
  if (differs.length)
    fail(`this version of Tenuis plans its case differently from the one that wrote it: ${differs.join('; ')}`);
  const wallNames = wallNamesOf(plan);
  if (header.wallNames.join() !== wallNames.join())
    fail(`header.wallNames is [${header.wallNames.join(', ')}]; its case has walls [${wallNames.join(', ')}]`);

  if (header.seeds.length !== header.replicas)
    fail(`header.seeds lists ${header.seeds.length} seeds for ${header.replicas} replicas`);
  const series = new Map<string, Float64Array[]>();
  for (const key of seriesKeysOf(wallNames, geometry.sectionNames)) {
    series.set(
      key,
      Array.from({ length: header.replicas }, (_, r) => {
        const a = arrays.get(seriesArrayName(key, r));
        if (!a) fail(`array ${seriesArrayName(key, r)} is missing (header.replicas is ${header.replicas})`);
        return a;
      }),
    );
  }
  const cellWidth = geometry.cells * RAW_CELL_SUMS;
  const wallWidth = wallBinTotalOf(geometry) * SUMS_PER_WALL_BIN;
  return {
    plan,
    geometry,
    wallNames,
    cellStore: batchList(header.cellStore, 'cellStore', cellWidth, plan.batchSteps, arrays),
    wallStore: batchList(header.wallStore, 'wallStore', wallWidth, plan.batchSteps, arrays),
    series,
    pendingCellSums: arrayOf(arrays, 'pendingCellSums', cellWidth),
    pendingWallSums: arrayOf(arrays, 'pendingWallSums', wallWidth),
    pendingSteps: header.pendingSteps,
    counters: { ...header.counters },
    replicas: header.replicas,
    seeds: [...header.seeds],
  };
}
