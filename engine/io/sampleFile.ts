/**
 * Sample files: a SampleSet as one portable, versioned ArrayBuffer, so runs on many machines (or worker threads) can
 * be saved and merged later. Pure: bytes in, bytes out; the format is documented field by field in DEVELOPERS.md,
 * "Sample files".
 *
 *   0   8 bytes  magic 0x89 'T' 'N' 'S' 0x0D 0x0A 0x1A 0x0A
 *   8   uint32   format version (little-endian)
 *   12  uint32   header length H in bytes
 *   16  H bytes  header: UTF-8 JSON (sampleFileHeader.ts)
 *   …   zero bytes up to the next multiple of 8: the start of the data block
 *   …   arrays of little-endian float64, each at its directory offset (from the data block's start)
 *
 * The magic follows the reasoning of the PNG signature (PNG specification, ISO/IEC 15948, "PNG file signature";
 * from memory): the high first byte catches 7-bit transfers, CR LF and the final LF catch line-end conversion, and
 * 0x1A stops a text display. Reading the file validates everything once and re-plans its case, so a file from another
 * machine or an older version is refused with a message rather than misread.
 */
import { parseCase } from '../case/schema';
import { plan as planCase } from '../plan/plan';
import { wallNamesOf } from '../kernel/sideTable';
import type { BatchList } from '../stats/batchList';
import { seriesKeysOf } from '../results/seriesKeys';
import { geometryOf, geometryDifferences, wallBinTotalOf } from '../kernel/samplingGeometry';
import type { SampleSet } from '../results/sampleSet';
import {
  parseSampleFileHeader,
  SAMPLE_FILE_FORMAT,
  SAMPLE_FILE_DTYPE,
  type SampleFileHeader,
  type BatchStoreHeader,
} from './sampleFileHeader';
import { TextEncoder, TextDecoder } from './utf8';
import { RAW_CELL_SUMS, SUMS_PER_WALL_BIN } from '../kernel/layout';

export const SAMPLE_FILE_MAGIC = Uint8Array.of(0x89, 0x54, 0x4e, 0x53, 0x0d, 0x0a, 0x1a, 0x0a);
export const SAMPLE_FILE_VERSION = 1;
const PREAMBLE_BYTES = 16;

/** True on every platform we know of; the big-endian path is there so the format never depends on it. */
const HOST_LITTLE_ENDIAN = new Uint8Array(Float64Array.of(1).buffer)[7] === 0x3f;

const align8 = (n: number) => Math.ceil(n / 8) * 8;

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
  const arrays = arraysOf(set);
  let offset = 0;
  const directory = arrays.map(([name, values]) => {
    const entry = { name, dtype: SAMPLE_FILE_DTYPE, offset, length: values.length };
    offset += values.length * 8;
    return entry;
  });
  const g = set.geometry;
  const p = set.plan;
  const header: SampleFileHeader = {
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
    arrays: directory,
  };
  const headerBytes = new TextEncoder().encode(JSON.stringify(header));
  const dataStart = align8(PREAMBLE_BYTES + headerBytes.length);
  const buffer = new ArrayBuffer(dataStart + offset);
  const bytes = new Uint8Array(buffer);
  bytes.set(SAMPLE_FILE_MAGIC, 0);
  const view = new DataView(buffer);
  view.setUint32(8, SAMPLE_FILE_VERSION, true);
  view.setUint32(12, headerBytes.length, true);
  bytes.set(headerBytes, PREAMBLE_BYTES);
  arrays.forEach(([, values], k) => {
    const at = dataStart + directory[k].offset;
    if (HOST_LITTLE_ENDIAN) new Float64Array(buffer, at, values.length).set(values);
    else for (let i = 0; i < values.length; i++) view.setFloat64(at + 8 * i, values[i], true);
  });
  return buffer;
}

function fail(message: string): never {
  throw new Error(`sample file: ${message}`);
}

function checkMagic(bytes: Uint8Array): void {
  const n = Math.min(bytes.length, SAMPLE_FILE_MAGIC.length);
  let same = true;
  for (let i = 0; i < n; i++) if (bytes[i] !== SAMPLE_FILE_MAGIC[i]) same = false;
  if (same) return;
  const found = Array.from(bytes.subarray(0, 8), (b) => b.toString(16).padStart(2, '0')).join(' ');
  const ours = bytes.length >= 4 && bytes[1] === 0x54 && bytes[2] === 0x4e && bytes[3] === 0x53;
  if (ours && bytes[0] === 0x09)
    fail(`the first 8 bytes (${found}) lost their high bit in a 7-bit transfer; copy the file as binary`);
  if (ours && bytes[0] === 0x89)
    fail(
      `the first 8 bytes (${found}) were altered, probably by a text-mode transfer that converted line ends; copy the file as binary`,
    );
  fail(`not a sample file: it starts with bytes ${found}, a sample file with 89 54 4e 53 0d 0a 1a 0a`);
}

/** The preamble and the header, validated; the start of the data block. */
function readHeader(buffer: ArrayBuffer): { header: SampleFileHeader; dataStart: number } {
  const bytes = new Uint8Array(buffer);
  checkMagic(bytes);
  if (bytes.length < PREAMBLE_BYTES)
    fail(`truncated: ${bytes.length} bytes, fewer than the ${PREAMBLE_BYTES}-byte preamble`);
  const view = new DataView(buffer);
  const version = view.getUint32(8, true);
  if (version > SAMPLE_FILE_VERSION)
    fail(
      `format version ${version} is newer than this version of Tenuis reads (${SAMPLE_FILE_VERSION}); update Tenuis to read it`,
    );
  if (version !== SAMPLE_FILE_VERSION)
    fail(`unknown format version ${version}; this version of Tenuis reads version ${SAMPLE_FILE_VERSION}`);
  const headerLength = view.getUint32(12, true);
  if (PREAMBLE_BYTES + headerLength > bytes.length)
    fail(
      `truncated: the header needs ${headerLength} bytes after the preamble, but the file has only ${bytes.length} bytes in all`,
    );
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(
      bytes.subarray(PREAMBLE_BYTES, PREAMBLE_BYTES + headerLength),
    );
  } catch {
    fail('the header is not valid UTF-8 (damaged file?)');
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (e) {
    fail(`the header is not valid JSON (damaged file?): ${(e as Error).message}`);
  }
  const parsed = parseSampleFileHeader(json);
  if (!parsed.ok) fail(`the header is not valid:\n  ${parsed.errors.join('\n  ')}`);
  return { header: parsed.value, dataStart: align8(PREAMBLE_BYTES + headerLength) };
}

/** Each directory array as a Float64Array (copied out of the file), checked for bounds and finite values. */
function readArrays(buffer: ArrayBuffer, header: SampleFileHeader, dataStart: number): Map<string, Float64Array> {
  const view = new DataView(buffer);
  const out = new Map<string, Float64Array>();
  for (const a of header.arrays) {
    const at = dataStart + a.offset;
    const end = at + 8 * a.length;
    if (end > buffer.byteLength)
      fail(`truncated: array ${a.name} needs bytes ${at}–${end}, but the file has only ${buffer.byteLength} bytes`);
    if (out.has(a.name)) fail(`the header lists array ${a.name} twice`);
    const values = HOST_LITTLE_ENDIAN
      ? new Float64Array(buffer.slice(at, end))
      : Float64Array.from({ length: a.length }, (_, i) => view.getFloat64(at + 8 * i, true));
    for (let i = 0; i < values.length; i++)
      if (!Number.isFinite(values[i]))
        fail(`array ${a.name} holds ${values[i]} at index ${i}; sample sums are always finite (damaged file?)`);
    out.set(a.name, values);
  }
  return out;
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
 */
export function decodeSampleSet(buffer: ArrayBuffer): SampleSet {
  const { header, dataStart } = readHeader(buffer);
  const parsed = parseCase(header.case);
  if (!parsed.ok) fail(`its case is not valid:\n  ${parsed.errors.join('\n  ')}`);
  const planned = planCase(parsed.value);
  if (!planned.ok) fail(`its case cannot be planned:\n  ${planned.errors.join('\n  ')}`);
  const plan = planned.plan;
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
