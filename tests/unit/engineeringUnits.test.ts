import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  convertFromSI,
  convertToSI,
  formatQuantity,
  kindOfUnit,
  parseQuantity,
  unitsOf,
  QUANTITY_KINDS,
} from '../../engine/units/engineeringUnits';

const close = (actual: number, expected: number, rel = 1e-12) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.max(Math.abs(expected), Number.MIN_VALUE));

const ARGON_MASS_KG = 66.3e-27; // Bird 1994 Table A1, from memory (as in engine/gas/species.ts)

describe('parseQuantity()', () => {
  it('parseQuantity() reads SI prefixes of the metre exactly (SI brochure, 9th ed., Table 7: exact by definition)', () => {
    close(parseQuantity('2mm', 'length'), 2e-3);
    close(parseQuantity('2 mm', 'length'), 2e-3);
    close(parseQuantity('1.5 µm', 'length'), 1.5e-6); // micro sign U+00B5
    close(parseQuantity('1.5 μm', 'length'), 1.5e-6); // Greek mu U+03BC
    close(parseQuantity('1.5um', 'length'), 1.5e-6);
    close(parseQuantity('40 nm', 'length'), 40e-9);
    close(parseQuantity('3 cm', 'length'), 0.03);
    close(parseQuantity('0.25 m', 'length'), 0.25);
  });

  it('parseQuantity() reads a plain number as SI', () => {
    expect(parseQuantity('0.002', 'length')).toBe(0.002);
    expect(parseQuantity('101325', 'pressure')).toBe(101325);
    expect(parseQuantity('300', 'temperature')).toBe(300);
    expect(parseQuantity('1e-3', 'length')).toBe(1e-3);
    expect(parseQuantity(' 0.5 ', 'dimensionless')).toBe(0.5);
  });

  it('parseQuantity() converts pressures with the NIST SP 811 (2008) Appendix B.8 factors', () => {
    close(parseQuantity('1 Pa', 'pressure'), 1);
    close(parseQuantity('2 kPa', 'pressure'), 2000);
    close(parseQuantity('1 bar', 'pressure'), 1e5); // bar = 1.0 E+05 Pa, exact
    close(parseQuantity('1 mbar', 'pressure'), 100); // from the bar
    close(parseQuantity('1 atm', 'pressure'), 101325); // standard atmosphere = 1.013 25 E+05 Pa, exact
    close(parseQuantity('760 Torr', 'pressure'), 101325); // torr = 101 325/760 Pa by definition
    close(parseQuantity('1 Torr', 'pressure'), 133.322368421, 1e-11); // SP 811 rounds it to 1.333 224 E+02
    close(parseQuantity('1000 mTorr', 'pressure'), 101325 / 760);
    // psi: SP 811 gives 6.894 757 E+03 Pa (rounded); the exact value from 1 lbf = 0.453 592 37 kg × 9.806 65 m/s²
    // and 1 in = 0.0254 m (both exact by definition, SP 811 B.8) is 6894.757293168…
    close(parseQuantity('1 psi', 'pressure'), 6894.757293168, 1e-12);
    expect(Math.abs(parseQuantity('1 psi', 'pressure') - 6894.757)).toBeLessThan(0.0005);
  });

  it('parseQuantity() converts Celsius with T/K = t/°C + 273.15 (SI brochure, 9th ed.: exact)', () => {
    close(parseQuantity('25C', 'temperature'), 298.15);
    close(parseQuantity('25 °C', 'temperature'), 298.15);
    close(parseQuantity('-40 degC', 'temperature'), 233.15);
    close(parseQuantity('0 °C', 'temperature'), 273.15);
    close(parseQuantity('273 K', 'temperature'), 273);
  });

  it('parseQuantity() accepts speeds in m/s, case-insensitive unit spellings and a Unicode minus sign', () => {
    expect(parseQuantity('100 m/s', 'speed')).toBe(100);
    close(parseQuantity('1 TORR', 'pressure'), 101325 / 760);
    close(parseQuantity('1 MM', 'length'), 1e-3);
    expect(parseQuantity('\u22125 m/s', 'speed')).toBe(-5);
  });

  it('parseQuantity() rejects a unit of the wrong kind with a message naming the accepted units', () => {
    expect(() => parseQuantity('2 bar', 'length')).toThrow(
      /unknown length unit "bar".*bar is a pressure unit.*accepted: m, cm, mm, µm/,
    );
    expect(() => parseQuantity('2 furlongs', 'length')).toThrow(
      /accepted: m, cm, mm, µm \(or μm, um, micron\), nm; a plain number means m/,
    );
    expect(() => parseQuantity('5 K', 'pressure')).toThrow(/Pa, kPa, mbar, bar, Torr, mTorr, atm, psi/);
    expect(() => parseQuantity('hot', 'temperature')).toThrow(/not a number.*K, °C/);
    expect(() => parseQuantity('', 'speed')).toThrow(/m\/s/);
    expect(() => parseQuantity('1e999 m', 'length')).toThrow(/finite/);
  });
});

describe('convertFromSI()', () => {
  it('convertFromSI() gives throughput and conductance units from the litre (1 L = 1e-3 m³, SI brochure Table 8)', () => {
    close(convertFromSI(0.1, 'mbar·L/s'), 1); // 100 Pa × 1e-3 m³
    close(convertFromSI(0.1, 'mbar L/s'), 1);
    close(convertFromSI(1, 'Pa·m³/s'), 1);
    close(convertFromSI(1, 'Pa m3/s'), 1);
    close(convertFromSI(101325 / 760 / 1000, 'Torr·L/s'), 1);
    close(convertFromSI(1e-3, 'L/s'), 1);
    close(convertFromSI(1, 'm^3/s'), 1);
    close(convertFromSI(300, '°C'), 26.85);
    close(convertFromSI(1e-3, 'mm'), 1);
  });

  it('convertFromSI() converts mass flow to sccm at 273.15 K and 101 325 Pa', () => {
    // Loschmidt constant n0 = p0/(k T0) at 273.15 K, 101.325 kPa: 2.686 780 111… e25 m⁻³ (CODATA 2018; published).
    // 1 sccm = n0 · 1e-6 m³ / 60 s molecules per second.
    const moleculesPerSecond = (2.686780111e25 * 1e-6) / 60;
    close(convertFromSI(moleculesPerSecond * ARGON_MASS_KG, 'sccm', { molecularMassKg: ARGON_MASS_KG }), 1, 1e-9);
    close(convertToSI(1, 'sccm', { molecularMassKg: ARGON_MASS_KG }), moleculesPerSecond * ARGON_MASS_KG, 1e-9);
    close(convertFromSI(2.5e-8, 'kg/s'), 2.5e-8);
  });

  it('convertFromSI() refuses sccm without a molecular mass and unknown units', () => {
    expect(() => convertFromSI(1e-8, 'sccm')).toThrow(/molecularMassKg/);
    expect(() => convertFromSI(1, 'parsec')).toThrow(/unknown unit "parsec"/);
  });

  it('formatQuantity() writes the value in the unit with its symbol', () => {
    expect(formatQuantity(1e-3, 'mm')).toBe('1 mm');
    expect(formatQuantity(298.15, 'C')).toBe('25 °C');
    expect(formatQuantity(101325, 'atm')).toBe('1 atm');
    expect(formatQuantity(0.5, '1')).toBe('0.5');
  });

  it('every unit belongs to one kind, and kindOfUnit() finds it', () => {
    for (const kind of QUANTITY_KINDS) for (const u of unitsOf(kind)) expect(kindOfUnit(u)).toBe(kind);
  });
});

describe('round trips (property-based)', () => {
  const context = { molecularMassKg: ARGON_MASS_KG };
  const allUnits = QUANTITY_KINDS.flatMap((kind) => unitsOf(kind).map((unit) => ({ kind, unit })));
  // Temperatures carry an offset (273.15 K), so compare to a tolerance scaled by the larger of value and offset.
  const tolerance = (x: number) => 1e-12 * Math.max(Math.abs(x), 300);

  it('convertFromSI(convertToSI(x, u), u) returns x for every unit', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e12, max: 1e12, noNaN: true }), fc.constantFrom(...allUnits), (x, { unit }) => {
        const back = convertFromSI(convertToSI(x, unit, context), unit, context);
        return Math.abs(back - x) <= tolerance(x);
      }),
    );
  });

  it('parseQuantity(formatQuantity(x, u, 17), kind) returns x for every unit', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e12, max: 1e12, noNaN: true }),
        fc.constantFrom(...allUnits),
        (xSI, { kind, unit }) => {
          const text = formatQuantity(xSI, unit, 17, context);
          const back = parseQuantity(text, kind, context);
          return Math.abs(back - xSI) <= tolerance(xSI);
        },
      ),
    );
  });
});
