/** A growable Float64 series (one value per base batch), grown by doubling so pushes stay amortised O(1). */
export interface GrowableSeries {
  values: Float64Array;
  length: number;
}

export function createSeries(capacity = 256): GrowableSeries {
  return { values: new Float64Array(capacity), length: 0 };
}

export function pushSeries(s: GrowableSeries, v: number): void {
  if (s.length === s.values.length) {
    const grown = new Float64Array(s.values.length * 2);
    grown.set(s.values);
    s.values = grown;
  }
  s.values[s.length++] = v;
}

/** The filled part, as a view (no copy). */
export function seriesView(s: GrowableSeries): Float64Array {
  return s.values.subarray(0, s.length);
}
