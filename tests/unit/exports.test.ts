import { beforeAll, describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { planOrThrow as planFromCase, runToEnd } from '../support/planOrThrow';
import type { SimulationResult } from '../../engine/results/summarize';
import { CELL_FIELDS } from '../../engine/results/cellFields';
import { WALL_QUANTITIES } from '../../engine/results/wallQuantities';
import { csvDocument, csvField } from '../../engine/report/csv';
import { fieldsCsv, profilesCsv, surfacesCsv } from '../../engine/report/resultCsv';
import { resultFiles } from '../../engine/report/resultFiles';
import { summaryJson, summaryJsonText } from '../../engine/report/summaryJson';
import { continuumComparisonOf, type ContinuumComparison } from '../../engine/report/comparison';
import type { Plan } from '../../engine/plan/plan';
import { summarize } from '../../engine/run/simulationSamples';

/**
 * A small RFC 4180 reader (quoted fields, doubled quotes, CR/LF inside quotes; rows end in LF or CRLF), written here
 * so the test does not trust the writer's own idea of the format.
 */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let i = 0;
  let quoted = false;
  while (i < text.length) {
    const ch = text[i];
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i += 2;
        continue;
      }
      if (ch === '"') {
        quoted = false;
        i++;
        continue;
      }
      field += ch;
      i++;
      continue;
    }
    if (ch === '"' && field === '') {
      quoted = true;
      i++;
      continue;
    }
    if (ch === '"') throw new Error(`stray quote at offset ${i}`);
    if (ch === ',') {
      row.push(field);
      field = '';
      i++;
      continue;
    }
    if (ch === '\r' && text[i + 1] === '\n') {
      i++;
      continue;
    }
    if (ch === '\n') {
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
      i++;
      continue;
    }
    field += ch;
    i++;
  }
  if (quoted) throw new Error('unterminated quoted field');
  if (field !== '' || row.length) {
    row.push(field);
    rows.push(row);
  }
  return rows;
}

/** A real (tiny) Couette run, so every export sees the shapes summarize() really produces. */
function tinyResult(sampleSteps: number): SimulationResult {
  const input = buildPreset('couette', {
    cellsY: '6',
    particlesPerCell: '10',
    transientSteps: '20',
    sampleSteps: String(sampleSteps),
    knudsen: '0.5',
  });
  return summarize(runToEnd(input));
}

const performance = { wallSeconds: 0.5, particleSteps: 1000, particleStepsPerSecond: 2000 };

describe('CSV fields', () => {
  it('csvField() writes numbers as shortest round-trip text, never escaped', () => {
    expect(csvField(-1.5)).toBe('-1.5');
    expect(csvField(1e-300)).toBe('1e-300');
    expect(csvField(0.1 + 0.2)).toBe('0.30000000000000004');
    expect(Number(csvField(Math.PI))).toBe(Math.PI);
    expect(csvField(NaN)).toBe('');
    expect(csvField(Infinity)).toBe('');
  });

  it('csvField() escapes text a spreadsheet would run as a formula (OWASP CSV injection) and quotes per RFC 4180', () => {
    expect(csvField('=HYPERLINK("x")')).toBe(`"'=HYPERLINK(""x"")"`);
    expect(csvField('+1')).toBe("'+1");
    expect(csvField('-1')).toBe("'-1");
    expect(csvField('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('line\nbreak')).toBe('"line\nbreak"');
    expect(csvField('plain')).toBe('plain');
  });

  it('csvDocument() output parses back to the same cells, with LF line ends', () => {
    const header = ['name', 'value [Pa]'];
    const rows: (string | number)[][] = [
      ['a "quoted", text', 1.25],
      ['=1+1', -3],
      ['two\nlines', NaN],
    ];
    const text = csvDocument(header, rows);
    expect(text.includes('\r')).toBe(false);
    expect(text.endsWith('\n')).toBe(true);
    expect(parseCsv(text)).toEqual([
      ['name', 'value [Pa]'],
      ['a "quoted", text', '1.25'],
      ["'=1+1", '-3'],
      ['two\nlines', ''],
    ]);
  });
});

describe('result exports', () => {
  let result: SimulationResult;
  let single: SimulationResult;
  beforeAll(() => {
    result = tinyResult(400);
    single = tinyResult(1); // one sampled step: no complete pair of batches, so every ci95 is NaN
  });

  it('profilesCsv() has one row per row of cells, units in every header, and numbers that round-trip', () => {
    const rows = parseCsv(profilesCsv(result));
    const header = rows[0];
    expect(header[0]).toBe('y [m]');
    expect(header).toHaveLength(1 + 2 * CELL_FIELDS.length);
    CELL_FIELDS.forEach((f, k) => {
      expect(header[1 + 2 * k]).toBe(`${f.name} [${f.unit}]`);
      expect(header[2 + 2 * k]).toBe(`${f.name} ci95 [${f.unit}]`);
    });
    for (const h of header) expect(h).toMatch(/ \[[^\]]+\]$/);
    expect(rows).toHaveLength(1 + result.profile.rows);
    const width = CELL_FIELDS.length;
    for (let r = 0; r < result.profile.rows; r++) {
      expect(Number(rows[r + 1][0])).toBe(result.profileY[r]);
      for (let f = 0; f < width; f++) {
        const mean = result.profile.mean[r * width + f];
        const cell = rows[r + 1][1 + 2 * f];
        if (Number.isFinite(mean)) expect(Number(cell)).toBe(mean);
        else expect(cell).toBe('');
      }
    }
  });

  it('fieldsCsv() has one row per cell with x and y of the cell centre', () => {
    const rows = parseCsv(fieldsCsv(result));
    expect(rows[0].slice(0, 3)).toEqual(['x [m]', 'y [m]', 'numberDensity [1/m^3]']);
    expect(rows).toHaveLength(1 + result.cells.rows);
    rows.slice(1).forEach((row, c) => {
      expect(Number(row[0])).toBe(result.cellX[c]);
      expect(Number(row[1])).toBe(result.cellY[c]);
      expect(Number(row[2])).toBe(result.cells.mean[c * CELL_FIELDS.length]);
      expect(row).toHaveLength(rows[0].length);
    });
  });

  it('surfacesCsv() has one row per wall bin, named by wall, with the four wall quantities', () => {
    const rows = parseCsv(surfacesCsv(result));
    expect(rows[0]).toEqual([
      'wall',
      'position [m]',
      'shearStress [Pa]',
      'shearStress ci95 [Pa]',
      'normalStress [Pa]',
      'normalStress ci95 [Pa]',
      'heatFlux [W/m^2]',
      'heatFlux ci95 [W/m^2]',
      'numberFlux [1/(m^2 s)]',
      'numberFlux ci95 [1/(m^2 s)]',
    ]);
    const bins = (result.wallBins.bottom?.table.rows ?? 0) + (result.wallBins.top?.table.rows ?? 0);
    expect(rows).toHaveLength(1 + bins);
    expect(rows.slice(1).map((r) => r[0])).toEqual(['bottom', 'top']);
    expect(Number(rows[1][2])).toBe(result.wallBins.bottom!.table.mean[0]);
  });

  it('summaryJson() carries reference, numerics, walls, units and performance in SI', () => {
    const s = summaryJson(result, { performance, caseName: 'tiny' });
    expect(s.reference.pressure).toBe(result.reference.pressurePa);
    expect(s.reference.knudsen).toBeCloseTo(0.5, 12);
    expect(s.numerics.sampleSteps).toBe(400);
    for (const key of Object.keys(result.numerics)) expect(s.numerics).toHaveProperty(key);
    for (const wall of ['bottom', 'top'] as const) {
      for (const q of WALL_QUANTITIES) {
        expect(Object.keys(s.walls[wall]![q]).sort()).toEqual([
          'ci95',
          'correlationTimeSteps',
          'effectiveSamples',
          'mean',
          'plateauFound',
        ]);
        expect(s.walls[wall]![q].mean).toBe(result.walls[wall]![q].mean);
      }
    }
    expect(s.units).toMatchObject({
      pressure: 'Pa',
      temperature: 'K',
      meanFreePath: 'm',
      viscosity: 'Pa s',
      shearStress: 'Pa',
      heatFlux: 'W/m^2',
      timeStep: 's',
      wallSeconds: 's',
    });
    for (const name of [
      ...Object.keys(s.reference),
      ...Object.keys(s.numerics),
      ...WALL_QUANTITIES,
      ...Object.keys(s.performance),
    ]) {
      expect(s.units, name).toHaveProperty(name);
    }
    expect(s.performance).toEqual(performance);
    expect(s.caseName).toBe('tiny');
  });

  it('summaryJsonText() writes NaN as null, never as "NaN"', () => {
    expect(Number.isNaN(single.walls.top!.shearStress.ci95)).toBe(true);
    const text = summaryJsonText(single, {
      performance: { ...performance, particleStepsPerSecond: NaN },
      caseName: 'one step',
    });
    expect(text).not.toMatch(/NaN|Infinity/);
    const back = JSON.parse(text);
    expect(back.walls.top.shearStress.ci95).toBeNull();
    expect(back.performance.particleStepsPerSecond).toBeNull();
    expect(summaryJson(single, { performance, caseName: 'x' }).walls.top!.shearStress.ci95).toBeNull();
  });

  it('CSV exports of a result without error bars leave the ci95 fields empty', () => {
    const rows = parseCsv(profilesCsv(single));
    expect(rows[1][2]).toBe(''); // numberDensity ci95
    expect(Number(rows[1][1])).toBeGreaterThan(0);
  });

  it('resultFiles() names the four files', () => {
    expect(Object.keys(resultFiles(result, { performance, caseName: 'x' }))).toEqual([
      'summary.json',
      'profiles.csv',
      'fields.csv',
      'surfaces.csv',
    ]);
  });
});

describe('result exports with a continuum comparison', () => {
  let plan: Plan;
  let result: SimulationResult;
  let comparison: ContinuumComparison;
  beforeAll(() => {
    const sim = runToEnd(
      buildPreset('couette', {
        cellsY: '6',
        particlesPerCell: '10',
        transientSteps: '20',
        sampleSteps: '400',
        knudsen: '0.5',
      }),
    );
    plan = sim.plan;
    result = summarize(sim);
    const c = continuumComparisonOf(plan, result);
    if (!c.recognised) throw new Error(c.reason);
    comparison = c;
  });

  it('profilesCsv(result, comparison) puts one column per model after each quantity a model predicts, units in the header', () => {
    const rows = parseCsv(profilesCsv(result, comparison));
    const header = rows[0];
    const at = header.indexOf('velocityX ci95 [m/s]');
    expect(header.slice(at + 1, at + 5)).toEqual([
      'velocityX noSlip [m/s]',
      'velocityX firstOrder [m/s]',
      'velocityX secondOrder [m/s]',
      'velocityX freeMolecular [m/s]',
    ]);
    const t = header.indexOf('temperature ci95 [K]');
    expect(header.slice(t + 1, t + 4)).toEqual([
      'temperature noSlip [K]',
      'temperature firstOrder [K]',
      'temperature secondOrder [K]',
    ]);
    expect(header).toHaveLength(1 + 2 * CELL_FIELDS.length + 7);
    for (const h of header) expect(h).toMatch(/ \[[^\]]+\]$/);
    for (let r = 0; r < result.profile.rows; r++) {
      expect(Number(rows[r + 1][at + 2])).toBe(comparison.profiles.firstOrder!['profile.velocityX'][r]);
      expect(rows[r + 1]).toHaveLength(header.length);
    }
  });

  it('summaryJson() with a comparison carries continuum, verdict and continuumModels, and units for every compared quantity', () => {
    const s = summaryJson(result, { performance, caseName: 'tiny', comparison });
    expect(s.continuum!.noSlip['walls.bottom.shearStress']).toBe(
      comparison.continuum.noSlip!['walls.bottom.shearStress'],
    );
    expect(Object.keys(s.verdict!)).toEqual(
      expect.arrayContaining([
        'walls.bottom.shearStress',
        'walls.top.heatFlux',
        'profile.velocityX',
        'profile.temperature',
      ]),
    );
    const { headline, headlineQuantity, ...quantities } = s.verdict!;
    expect(headline).toMatch(/the wall shear stress/);
    expect(headlineQuantity).toBe('walls.bottom.shearStress');
    for (const v of Object.values(quantities)) {
      if (typeof v === 'string') throw new Error('a quantity verdict is an object');
      expect(typeof v.text).toBe('string');
      expect(Object.keys(v)).toEqual(expect.arrayContaining(['status', 'bestModel', 'deviation', 'text']));
    }
    expect(s.continuumModels!.problem).toBe('couette');
    expect(s.continuumModels!.meanFreePath.kind).toBe('viscosity');
    expect(s.units['walls.bottom.shearStress']).toBe('Pa');
    expect(s.units['profile.velocityX']).toBe('m/s');
    expect(JSON.stringify(s)).not.toMatch(/NaN|Infinity/);
  });

  it('resultFiles(result, { plan }) writes the comparison; without one the files are as before', () => {
    const withPlan = resultFiles(result, { performance, caseName: 'x', plan });
    expect(JSON.parse(withPlan['summary.json']).verdict['walls.top.shearStress'].text).toBe(
      comparison.verdict['walls.top.shearStress'].text,
    );
    expect(withPlan['profiles.csv']).toContain('velocityX noSlip [m/s]');
    expect(Object.keys(withPlan)).toContain('verdict.csv');
    expect(withPlan['verdict.csv']).toMatch(/^quantity,unit,model,status,/);
    const plain = resultFiles(result, { performance, caseName: 'x' });
    expect(plain['summary.json']).not.toContain('"verdict"');
    expect(plain['profiles.csv']).toBe(profilesCsv(result));
    expect(Object.keys(plain)).not.toContain('verdict.csv');
  });

  it('summaryJson() says why when no continuum model applies', () => {
    const c = structuredClone(plan.caseData);
    c.boundaries.top = { ...c.boundaries.top, velocityMPerS: [0, 0, 0] } as typeof c.boundaries.top;
    c.boundaries.bottom = { ...c.boundaries.bottom, velocityMPerS: [0, 0, 0] } as typeof c.boundaries.bottom;
    const other = planFromCase(c);
    const note = continuumComparisonOf(other, result);
    const s = summaryJson(result, { performance, caseName: 'x', comparison: note });
    expect(s.continuumNote).toMatch(/equilibrium/);
    expect(s.continuum).toBeUndefined();
  });
});
