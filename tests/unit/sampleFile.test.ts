import { beforeAll, describe, expect, it } from 'vitest';
import { encodeSampleSet, decodeSampleSet, SAMPLE_FILE_MAGIC, SAMPLE_FILE_VERSION } from '../../engine/io/sampleFile';
import { summarizeSamples } from '../../engine/results/summarize';
import { mergeSampleSets } from '../../engine/results/mergeSamples';
import type { SampleSet } from '../../engine/results/sampleSet';
import { couetteReplica, differingLeaves } from '../support/sampleSets';

let single: SampleSet;
let partial: SampleSet;
let merged: SampleSet;
beforeAll(() => {
  single = couetteReplica(41);
  partial = couetteReplica(42, 1237);
  merged = mergeSampleSets([single, partial, couetteReplica(43)]);
});

const headerText = (buffer: ArrayBuffer) =>
  new TextDecoder().decode(new Uint8Array(buffer, 16, new DataView(buffer).getUint32(12, true)));

describe('sample files', () => {
  it('encode → decode gives identical summarizeSamples output (one replica, part-filled batches, merged replicas)', () => {
    for (const set of [single, partial, merged]) {
      const back = decodeSampleSet(encodeSampleSet(set));
      expect(differingLeaves(summarizeSamples(back), summarizeSamples(set))).toEqual([]);
      expect(back.series).toEqual(set.series);
      expect(back.cellStore.segments).toEqual(set.cellStore.segments);
      expect(back.seeds).toEqual(set.seeds);
    }
  });

  it('lays the file out as documented: magic, version, JSON header, 8-byte-aligned little-endian float64 arrays', () => {
    const buffer = encodeSampleSet(single);
    expect(Array.from(new Uint8Array(buffer, 0, 8))).toEqual(Array.from(SAMPLE_FILE_MAGIC));
    expect(new DataView(buffer).getUint32(8, true)).toBe(SAMPLE_FILE_VERSION);
    const header = JSON.parse(headerText(buffer));
    expect(header.format).toBe('tenuis-samples');
    const dataStart = Math.ceil((16 + new DataView(buffer).getUint32(12, true)) / 8) * 8;
    const side = header.arrays.find((a: { name: string }) => a.name === 'sideTable');
    expect(side.dtype).toBe('float64le');
    const view = new DataView(buffer);
    for (let i = 0; i < side.length; i++)
      expect(view.getFloat64(dataStart + side.offset + 8 * i, true)).toBe(single.geometry.sideTable[i]);
    const last = header.arrays[header.arrays.length - 1];
    expect(buffer.byteLength).toBe(dataStart + last.offset + 8 * last.length);
  });

  it('decode rejects a corrupted magic, and says so when line ends were converted', () => {
    const buffer = encodeSampleSet(single);
    const wrong = buffer.slice(0);
    new Uint8Array(wrong)[0] = 0x50;
    expect(() => decodeSampleSet(wrong)).toThrow(/sample file: not a sample file: it starts with bytes 50 54 4e 53/);
    const textMode = buffer.slice(0);
    new Uint8Array(textMode)[4] = 0x0a; // CR LF → LF
    expect(() => decodeSampleSet(textMode)).toThrow(/text-mode transfer/);
    const sevenBit = buffer.slice(0);
    new Uint8Array(sevenBit)[0] = 0x09;
    expect(() => decodeSampleSet(sevenBit)).toThrow(/7-bit transfer/);
    expect(() => decodeSampleSet(new TextEncoder().encode('{"format":"tenuis-samples"}').buffer)).toThrow(
      /not a sample file/,
    );
  });

  it('decode rejects a truncated buffer wherever it was cut', () => {
    const buffer = encodeSampleSet(single);
    const headerLength = new DataView(buffer).getUint32(12, true);
    for (const length of [0, 5, 12, 16 + Math.floor(headerLength / 2), buffer.byteLength - 8, buffer.byteLength - 1]) {
      expect(() => decodeSampleSet(buffer.slice(0, length)), `cut at ${length}`).toThrow(/sample file: truncated/);
    }
  });

  it('decode rejects a future version, and an unknown one', () => {
    const future = encodeSampleSet(single);
    new DataView(future).setUint32(8, SAMPLE_FILE_VERSION + 1, true);
    expect(() => decodeSampleSet(future)).toThrow(
      /format version 2 is newer than this version of Tenuis reads \(1\); update Tenuis/,
    );
    const zero = encodeSampleSet(single);
    new DataView(zero).setUint32(8, 0, true);
    expect(() => decodeSampleSet(zero)).toThrow(/unknown format version 0/);
  });

  it('decode rejects a case that fails parseCase, naming the field', () => {
    const c = single.plan.caseData;
    const bad = { ...single, plan: { ...single.plan, caseData: { ...c, initial: { ...c.initial, pressurePa: -1 } } } };
    expect(() => decodeSampleSet(encodeSampleSet(bad))).toThrow(
      /sample file: its case is not valid:\n\s+initial\.pressurePa: initial pressure \(Pa\) must be greater than zero/,
    );
  });

  it('decode rejects a damaged header or array with messages', () => {
    const buffer = encodeSampleSet(single);
    // The header is ASCII up to "replicas" except for the case description (which holds "±"): find it by bytes.
    const text = headerText(buffer);
    const at = 16 + new TextEncoder().encode(text.slice(0, text.indexOf('"replicas":1'))).length;
    const damaged = buffer.slice(0);
    new Uint8Array(damaged).set(new TextEncoder().encode('"replicas":0'), at);
    expect(() => decodeSampleSet(damaged)).toThrow(/the header is not valid:\n\s+header\.replicas/);
    const notJson = buffer.slice(0);
    new Uint8Array(notJson)[16] = 0x78; // the opening brace becomes a bare "x"
    expect(() => decodeSampleSet(notJson)).toThrow(/header is not valid JSON/);
    const nan = buffer.slice(0);
    new DataView(nan).setFloat64(nan.byteLength - 8, NaN, true);
    expect(() => decodeSampleSet(nan)).toThrow(/holds NaN at index/);
  });
});
