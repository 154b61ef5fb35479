/**
 * The one binary container of Tenuis's files (sample files, checkpoints): a preamble, a JSON header and aligned
 * float64 arrays listed in the header's directory. Each format brings its own magic, version and header; the
 * container does the framing and the checks every format needs, with messages that start with the format's name.
 *
 *   0   8 bytes  magic 0x89 'T' 'N' <letter> 0x0D 0x0A 0x1A 0x0A  (the letter names the format)
 *   8   uint32   format version (little-endian)
 *   12  uint32   header length H in bytes
 *   16  H bytes  header: UTF-8 JSON, an object whose last member `arrays` is the directory
 *   …   zero bytes up to the next multiple of 8: the start of the data block
 *   …   arrays of little-endian float64, each at its directory offset (from the data block's start), packed in order
 *
 * The magic follows the reasoning of the PNG signature (PNG specification, ISO/IEC 15948, "PNG file signature";
 * from memory): the high first byte catches 7-bit transfers, CR LF and the final LF catch line-end conversion, and
 * 0x1A stops a text display. Pure: bytes in, bytes out, no Node or DOM API.
 */
import { TextEncoder, TextDecoder } from './utf8';

/** The one array element type: IEEE 754 double, little-endian. */
export const CONTAINER_DTYPE = 'float64le' as const;

/** Directory entry of one array. */
export interface ContainerArray {
  readonly name: string;
  readonly dtype: typeof CONTAINER_DTYPE;
  /** Bytes from the start of the data block; a multiple of 8. */
  readonly offset: number;
  /** Number of values. */
  readonly length: number;
}

/** What tells one format from another: its name (in messages), magic and the version this build writes. */
export interface ContainerFormat {
  /** How messages name a file of the format, e.g. "sample file"; messages start with `${what}: `. */
  readonly what: string;
  readonly magic: Uint8Array;
  readonly version: number;
  /** Said after the message that refuses a file of an older version (e.g. what to do instead). */
  readonly olderVersionAdvice?: string;
}

export const PREAMBLE_BYTES = 16;

/** True on every platform we know of; the big-endian path is there so the format never depends on it. */
const HOST_LITTLE_ENDIAN = new Uint8Array(Float64Array.of(1).buffer)[7] === 0x3f;

const align8 = (n: number) => Math.ceil(n / 8) * 8;

/** Throws the format's Error: `${what}: ${message}`. */
export function containerError(format: ContainerFormat, message: string): never {
  throw new Error(`${format.what}: ${message}`);
}

/**
 * A container (a fresh ArrayBuffer, ready to transfer or write): `header` with the directory of `arrays` appended
 * as its last member, then the arrays in the order given.
 */
export function encodeContainer(
  format: ContainerFormat,
  header: object,
  arrays: readonly (readonly [string, Float64Array])[],
): ArrayBuffer {
  let offset = 0;
  const directory: ContainerArray[] = arrays.map(([name, values]) => {
    const entry = { name, dtype: CONTAINER_DTYPE, offset, length: values.length };
    offset += values.length * 8;
    return entry;
  });
  const headerBytes = new TextEncoder().encode(JSON.stringify({ ...header, arrays: directory }));
  const dataStart = align8(PREAMBLE_BYTES + headerBytes.length);
  const buffer = new ArrayBuffer(dataStart + offset);
  const bytes = new Uint8Array(buffer);
  bytes.set(format.magic, 0);
  const view = new DataView(buffer);
  view.setUint32(8, format.version, true);
  view.setUint32(12, headerBytes.length, true);
  bytes.set(headerBytes, PREAMBLE_BYTES);
  arrays.forEach(([, values], k) => {
    const at = dataStart + directory[k].offset;
    if (HOST_LITTLE_ENDIAN) new Float64Array(buffer, at, values.length).set(values);
    else for (let i = 0; i < values.length; i++) view.setFloat64(at + 8 * i, values[i], true);
  });
  return buffer;
}

function checkMagic(bytes: Uint8Array, format: ContainerFormat): void {
  const magic = format.magic;
  const n = Math.min(bytes.length, magic.length);
  let same = true;
  for (let i = 0; i < n; i++) if (bytes[i] !== magic[i]) same = false;
  if (same) return;
  const fail = (message: string) => containerError(format, message);
  const hex = (b: Uint8Array) => Array.from(b, (x) => x.toString(16).padStart(2, '0')).join(' ');
  const found = hex(bytes.subarray(0, 8));
  const ours = bytes.length >= 4 && bytes[1] === magic[1] && bytes[2] === magic[2] && bytes[3] === magic[3];
  if (ours && bytes[0] === 0x09)
    fail(`the first 8 bytes (${found}) lost their high bit in a 7-bit transfer; copy the file as binary`);
  if (ours && bytes[0] === 0x89)
    fail(
      `the first 8 bytes (${found}) were altered, probably by a text-mode transfer that converted line ends; copy the file as binary`,
    );
  fail(`not a ${format.what}: it starts with bytes ${found}, a ${format.what} with ${hex(magic)}`);
}

/**
 * The preamble and the header of a container, checked: magic, version, length, UTF-8, JSON. Returns the parsed
 * header (for the format to validate) and the start of the data block.
 */
export function decodeContainerHeader(
  buffer: ArrayBuffer,
  format: ContainerFormat,
): { header: unknown; dataStart: number } {
  const fail = (message: string) => containerError(format, message);
  const bytes = new Uint8Array(buffer);
  checkMagic(bytes, format);
  if (bytes.length < PREAMBLE_BYTES)
    fail(`truncated: ${bytes.length} bytes, fewer than the ${PREAMBLE_BYTES}-byte preamble`);
  const view = new DataView(buffer);
  const version = view.getUint32(8, true);
  const current = format.version;
  if (version > current)
    fail(`format version ${version} is newer than this version of Tenuis reads (${current}); update Tenuis to read it`);
  if (version >= 1 && version < current)
    fail(
      `format version ${version} is older than this version of Tenuis reads (${current})${format.olderVersionAdvice ? `; ${format.olderVersionAdvice}` : ''}`,
    );
  if (version !== current) fail(`unknown format version ${version}; this version of Tenuis reads version ${current}`);
  const headerLength = view.getUint32(12, true);
  if (PREAMBLE_BYTES + headerLength > bytes.length)
    fail(
      `truncated: the header needs ${headerLength} bytes after the preamble, but the file has only ${bytes.length} bytes in all`,
    );
  let text = '';
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(
      bytes.subarray(PREAMBLE_BYTES, PREAMBLE_BYTES + headerLength),
    );
  } catch {
    fail('the header is not valid UTF-8 (damaged file?)');
  }
  let header: unknown;
  try {
    header = JSON.parse(text);
  } catch (e) {
    fail(`the header is not valid JSON (damaged file?): ${(e as Error).message}`);
  }
  return { header, dataStart: align8(PREAMBLE_BYTES + headerLength) };
}

/** A directory from an unvalidated header (formats without a schema of their own for it), checked entry by entry. */
export function containerDirectoryOf(header: unknown, format: ContainerFormat): ContainerArray[] {
  const list = (header as { arrays?: unknown } | null)?.arrays;
  if (!Array.isArray(list)) containerError(format, 'the header has no array directory (damaged file?)');
  return list.map((entry: Partial<ContainerArray> | null, k: number) => {
    const { name, dtype, offset, length } = entry ?? {};
    const count = (n: unknown) => typeof n === 'number' && Number.isInteger(n) && n >= 0;
    if (typeof name !== 'string' || !name) containerError(format, `header.arrays.${k}: an array needs a name`);
    if (dtype !== CONTAINER_DTYPE) containerError(format, `header.arrays.${k}: array dtype must be ${CONTAINER_DTYPE}`);
    if (!count(offset) || offset! % 8 !== 0)
      containerError(format, `header.arrays.${k}: array offsets must be multiples of 8 bytes`);
    if (!count(length)) containerError(format, `header.arrays.${k}: array length must be a whole number`);
    return { name, dtype, offset: offset!, length: length! };
  });
}

/**
 * Each directory array as a Float64Array copied out of the buffer (so the buffer may be dropped or transferred),
 * checked for bounds and for names listed twice; `check` (the format's own test of the values) sees each array as
 * soon as it is read.
 */
export function readContainerArrays(
  buffer: ArrayBuffer,
  directory: readonly ContainerArray[],
  dataStart: number,
  format: ContainerFormat,
  check?: (name: string, values: Float64Array) => void,
): Map<string, Float64Array> {
  const fail = (message: string) => containerError(format, message);
  const view = new DataView(buffer);
  const out = new Map<string, Float64Array>();
  for (const a of directory) {
    const at = dataStart + a.offset;
    const end = at + 8 * a.length;
    if (end > buffer.byteLength)
      fail(`truncated: array ${a.name} needs bytes ${at}–${end}, but the file has only ${buffer.byteLength} bytes`);
    if (out.has(a.name)) fail(`the header lists array ${a.name} twice`);
    const values = HOST_LITTLE_ENDIAN
      ? new Float64Array(buffer.slice(at, end))
      : Float64Array.from({ length: a.length }, (_, i) => view.getFloat64(at + 8 * i, true));
    check?.(a.name, values);
    out.set(a.name, values);
  }
  return out;
}
