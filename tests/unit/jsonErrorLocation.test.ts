import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { jsonErrorOffset, locationOf } from '../../cli/jsonErrorLocation';

describe('jsonErrorOffset()', () => {
  it('jsonErrorOffset() returns -1 for every text JSON.parse accepts (fast-check fc.json())', () => {
    fc.assert(fc.property(fc.json(), (text) => jsonErrorOffset(text) === -1));
  });

  it('jsonErrorOffset() finds an error wherever JSON.parse throws, for random cuts of valid JSON', () => {
    fc.assert(
      fc.property(fc.json(), fc.nat(), (text, cut) => {
        const broken = text.slice(0, cut % (text.length + 1));
        let valid = true;
        try {
          JSON.parse(broken);
        } catch {
          valid = false;
        }
        return valid === (jsonErrorOffset(broken) === -1);
      }),
    );
  });

  it('jsonErrorOffset() points at the offending character', () => {
    const text = '{\n  "a": 1,\n  "b": tru\n}';
    expect(locationOf(text, jsonErrorOffset(text))).toEqual({ line: 3, column: 11 });
    expect(jsonErrorOffset('[1, 2,]')).toBe(6);
    expect(jsonErrorOffset('{"a": 1} x')).toBe(9);
    expect(jsonErrorOffset('"\\q"')).toBe(2);
    expect(jsonErrorOffset('')).toBe(0);
  });
});
