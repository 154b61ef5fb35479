/**
 * The results view's pure pieces: profiles along cuts through the cell grid (which cells, their ci95, block cells as
 * gaps), speed and Mach number derived from cell means with first-order error propagation, the cut's CSV, and the
 * wall and block outlines drawn over the field map.
 */
import { describe, expect, it } from 'vitest';
import type { FieldTable } from '../../engine/results/summarize';
import { cutProfileCsv } from '../../engine/report/cutProfileCsv';
import { buildPreset } from '../../engine/case/presets';
import {
  cutColumn,
  extractCut,
  nearestCentre,
  cellCentres,
  GAP_EMPTY,
  GAP_SOLID,
  type CutSource,
} from '../../app/results/profileCut';
import { machOf, speedOf, withDerivedFields } from '../../app/results/derivedFields';
import { geometryOverlay } from '../../app/results/geometryOverlay';
import { resultGeometryOf } from '../../app/bridge/runApi';

const NAMES = ['numberDensity', 'velocityX', 'velocityY', 'velocityZ', 'temperature'];
const UNITS = ['1/m^3', 'm/s', 'm/s', 'm/s', 'K'];

function table(rows: number[][], ci: number[][]): FieldTable {
  return {
    names: NAMES,
    units: UNITS,
    rows: rows.length,
    mean: Float64Array.from(rows.flat()),
    ci95: Float64Array.from(ci.flat()),
    batches: 16,
    batchLengthSteps: 100,
  };
}

/**
 * A 3 × 2 grid of 1 µm cells (cell index ix + 3·iy); cell 4 (ix 1, iy 1) lies inside a block: the engine reports it
 * with number density 0 and everything else NaN. Cell c has velocityX = 10c, ci95 = c/10 + 0.01.
 */
function source(): CutSource {
  const rows: number[][] = [];
  const ci: number[][] = [];
  for (let c = 0; c < 6; c++) {
    if (c === 4) {
      rows.push([0, NaN, NaN, NaN, NaN]);
      ci.push([NaN, NaN, NaN, NaN, NaN]);
    } else {
      rows.push([1e20 + c, 10 * c, 1, 0, 300 + c]);
      ci.push([1e18, c / 10 + 0.01, 0.1, 0.1, 2]);
    }
  }
  const profile = table(
    [
      [1e20, 10, 1, 0, 301],
      [2e20, 40, 1, 0, 304],
    ],
    [
      [1e18, 0.5, 0.1, 0.1, 1],
      [1e18, 0.7, 0.1, 0.1, 1],
    ],
  );
  return {
    numerics: { cellsX: 3, cellsY: 2 },
    cellX: Float64Array.from([0.5, 1.5, 2.5, 0.5, 1.5, 2.5].map((v) => v * 1e-6)),
    cellY: Float64Array.from([0.5, 0.5, 0.5, 1.5, 1.5, 1.5].map((v) => v * 1e-6)),
    cells: table(rows, ci),
    profileY: Float64Array.from([0.5e-6, 1.5e-6]),
    profile,
  };
}
const SOLID = Uint8Array.from([0, 0, 0, 0, 1, 0]);

describe('profile cuts', () => {
  it('a vertical cut takes the cells of one column along y, with their ci95; the block cell is a gap, not a zero', () => {
    const cut = extractCut(source(), { kind: 'vertical', index: 1 }, SOLID);
    expect(cut.along).toBe('y');
    expect(cut.atM).toBeCloseTo(1.5e-6, 12);
    expect(Array.from(cut.positionsM)).toEqual([0.5e-6, 1.5e-6]);
    const vx = cutColumn(cut, 'velocityX');
    expect(vx.mean[0]).toBe(10);
    expect(vx.ci95[0]).toBeCloseTo(0.11, 12);
    expect(Array.from(cut.gap)).toEqual([0, GAP_SOLID]);
    // Every quantity of the block cell is NaN, number density included (the engine's 0 means "no gas" here).
    expect(Number.isNaN(cutColumn(cut, 'numberDensity').mean[1])).toBe(true);
    expect(Number.isNaN(vx.mean[1])).toBe(true);
  });

  it('a horizontal cut takes one row of cells along x; without the geometry an unsampled cell is still a gap', () => {
    const cut = extractCut(source(), { kind: 'horizontal', index: 1 });
    expect(cut.along).toBe('x');
    expect(cut.atM).toBeCloseTo(1.5e-6, 12);
    expect(Array.from(cut.positionsM)).toEqual(Array.from(source().cellX).slice(0, 3));
    const vx = cutColumn(cut, 'velocityX');
    expect(vx.mean[0]).toBe(30);
    expect(vx.mean[2]).toBe(50);
    expect(vx.ci95[2]).toBeCloseTo(0.51, 12);
    expect(Array.from(cut.gap)).toEqual([0, GAP_EMPTY, 0]);
    expect(Number.isNaN(cutColumn(cut, 'numberDensity').mean[1])).toBe(true);
    expect(cutColumn(cut, 'temperature').mean).toEqual([303, NaN, 305]);
  });

  it('the average is the row-averaged profile along y, with no fixed coordinate; indices out of range are clamped', () => {
    const avg = extractCut(source(), { kind: 'average', index: 7 }, SOLID);
    expect(avg.along).toBe('y');
    expect(Number.isNaN(avg.atM)).toBe(true);
    expect(cutColumn(avg, 'velocityX')).toEqual({ mean: [10, 40], ci95: [0.5, 0.7] });
    expect(Array.from(avg.gap)).toEqual([0, 0]);
    expect(extractCut(source(), { kind: 'vertical', index: 9 }).atM).toBeCloseTo(2.5e-6, 12);
  });

  it('positions snap to the nearest cell centre', () => {
    const xs = cellCentres(source(), 'x');
    expect(Array.from(xs)).toEqual(Array.from(source().cellX).slice(0, 3));
    expect(Array.from(cellCentres(source(), 'y'))).toEqual([0.5e-6, 1.5e-6]);
    expect(nearestCentre(xs, 1.9e-6)).toBe(1);
    expect(nearestCentre(xs, 2.1e-6)).toBe(2);
    expect(nearestCentre(xs, -5)).toBe(0);
    expect(nearestCentre(xs, 1)).toBe(2);
  });
});

describe('derived fields', () => {
  // Argon: m = 6.6335e-26 kg, ζ = 0, γ = 5/3. a = sqrt(γ k T / m) at 300 K = 322.593 m/s (computed by hand).
  const argon = { massKg: 6.6335e-26, rotationalDof: 0, heatCapacityRatio: 5 / 3 };

  it('speed |u| = sqrt(ux² + uy² + uz²), δ|u| = sqrt(Σ (u_i/|u|)² δu_i²); at |u| = 0 the bound sqrt(Σ δu_i²)', () => {
    const s = speedOf([3, 4, 0], [0.3, 0.4, 0.2]);
    expect(s.mean).toBe(5);
    // (0.6·0.3)² + (0.8·0.4)² + 0 = 0.0324 + 0.1024.
    expect(s.ci95).toBeCloseTo(Math.sqrt(0.1348), 12);
    expect(speedOf([0, 0, 0], [0.3, 0.4, 0]).ci95).toBeCloseTo(0.5, 12);
  });

  it('Mach number M = |u|/sqrt(γkT/m), δM = sqrt((δ|u|/a)² + (M δT/(2T))²)', () => {
    const m = machOf({ mean: 5, ci95: 0.36715 }, 300, 3, argon);
    expect(m.mean).toBeCloseTo(5 / 322.5932506527366, 9);
    expect(m.ci95).toBeCloseTo(0.0011407559386179549, 9);
  });

  it('withDerivedFields appends speed and machNumber per row; rows without gas stay NaN; nothing twice', () => {
    const t = withDerivedFields(source().cells, argon);
    expect(t.names.slice(-2)).toEqual(['speed', 'machNumber']);
    expect(t.units.slice(-2)).toEqual(['m/s', '1']);
    const w = t.names.length;
    // Cell 2: u = (20, 1, 0), T = 302 K.
    const speed = Math.hypot(20, 1);
    expect(t.mean[2 * w + w - 2]).toBeCloseTo(speed, 12);
    expect(t.mean[2 * w + w - 1]).toBeCloseTo(speed / Math.sqrt(((5 / 3) * 1.380649e-23 * 302) / 6.6335e-26), 12);
    expect(t.mean[2 * w + 1]).toBe(20);
    expect(Number.isNaN(t.mean[4 * w + w - 2])).toBe(true);
    expect(withDerivedFields(t, argon).names).toHaveLength(w);
    expect(withDerivedFields(source().cells, null).names.slice(-1)).toEqual(['speed']);
  });
});

describe('cut CSV', () => {
  it('position and fixed coordinate in metres, each quantity with its ci95 and predictions, units in every header, gaps empty', () => {
    const cut = extractCut(source(), { kind: 'vertical', index: 1 }, SOLID);
    const csv = cutProfileCsv(cut, [
      { quantity: 'velocityX', model: 'first-order slip', values: [11, 41] },
      { quantity: 'velocityX', model: 'bad', values: [1] },
    ]);
    const lines = csv.split('\n');
    expect(lines.at(-1)).toBe('');
    const header = lines[0].split(',');
    expect(header.slice(0, 2)).toEqual(['y [m]', 'x [m]']);
    expect(header.slice(2, 4)).toEqual(['numberDensity [1/m^3]', 'numberDensity ci95 [1/m^3]']);
    expect(header.slice(4, 7)).toEqual(['velocityX [m/s]', 'velocityX ci95 [m/s]', 'velocityX first-order slip [m/s]']);
    expect(header).not.toContain('velocityX bad [m/s]');
    for (const h of header) expect(h).toMatch(/ \[[^\]]+\]$/);
    const first = lines[1].split(',');
    expect(Number(first[0])).toBe(0.5e-6);
    expect(Number(first[1])).toBe(1.5e-6);
    expect(Number(first[4])).toBe(10);
    expect(Number(first[5])).toBe(0.11);
    expect(Number(first[6])).toBe(11);
    // The block cell: empty fields, but the prediction (which exists there) kept.
    const second = lines[2].split(',');
    expect(second[2]).toBe('');
    expect(second[4]).toBe('');
    expect(second[6]).toBe('41');
    expect(lines).toHaveLength(4);
  });

  it('the row average has no fixed coordinate; formula-like and comma-holding header text is escaped (RFC 4180, OWASP)', () => {
    const avg = extractCut(source(), { kind: 'average', index: 0 });
    const csv = cutProfileCsv({ ...avg, names: ['=cmd', ...avg.names.slice(1)] }, [
      { quantity: 'velocityX', model: 'slip, 2nd "order"', values: [1, 2] },
    ]);
    const header = csv.split('\n')[0];
    expect(header.startsWith("y [m],'=cmd [1/m^3],'=cmd ci95 [1/m^3],velocityX [m/s]")).toBe(true);
    expect(header).toContain('"velocityX slip, 2nd ""order"" [m/s]"');
  });
});

describe('geometry of a result', () => {
  it('the slit case with plates as thick as the gap: two grey rectangles, no domain-side walls, solid cells in the plates, argon γ = 5/3', () => {
    const caseInput = buildPreset('slit', { gas: 'Ar', knudsen: '1', cellsY: '10', thicknessToGap: '1' });
    const g = resultGeometryOf(caseInput);
    expect(g).not.toBeNull();
    expect(g!.blocks.map((b) => b.name)).toEqual(['lowerPlate', 'upperPlate']);
    expect(g!.walls).toEqual([]);
    expect(g!.gas.heatCapacityRatio).toBeCloseTo(5 / 3, 12);
    expect(g!.gas.massKg).toBeGreaterThan(6.6e-26);
    const solid = g!.solidCells.reduce((s, v) => s + v, 0);
    expect(solid).toBeGreaterThan(0);
    expect(solid).toBeLessThan(g!.solidCells.length);
    // A cell is solid exactly when its whole box lies inside a plate (cells the plate edges cut keep their gas).
    const { cellsX, cellsY } = g!;
    expect(g!.solidCells).toHaveLength(cellsX * cellsY);
    const dx = g!.lengthXM / cellsX;
    const dy = g!.lengthYM / cellsY;
    const eps = 1e-9 * dx;
    for (let c = 0; c < g!.solidCells.length; c++) {
      const x0 = (c % cellsX) * dx;
      const y0 = Math.floor(c / cellsX) * dy;
      const covered = g!.blocks.some(
        (b) => x0 >= b.x0 - eps && x0 + dx <= b.x1 + eps && y0 >= b.y0 - eps && y0 + dy <= b.y1 + eps,
      );
      expect(g!.solidCells[c], `cell ${c}`).toBe(covered ? 1 : 0);
    }
    const overlay = geometryOverlay(g, 1e-6);
    expect(overlay.blockCount).toBe(2);
    expect(overlay.shapes.filter((s) => s.type === 'rect')).toHaveLength(2);
    const lower = g!.blocks[0];
    expect(overlay.shapes[0]).toMatchObject({
      type: 'rect',
      x0: lower.x0 / 1e-6,
      x1: lower.x1 / 1e-6,
      y0: lower.y0 / 1e-6,
      y1: lower.y1 / 1e-6,
    });
  });

  it('the Couette gap: bottom and top walls as thick lines labelled by name, nitrogen γ = 7/5', () => {
    const g = resultGeometryOf(buildPreset('couette', { gas: 'N2', knudsen: '1' }))!;
    expect(g.walls.map((w) => [w.side, w.normalIsX])).toEqual([
      ['bottom', false],
      ['top', false],
    ]);
    expect(g.gas.heatCapacityRatio).toBeCloseTo(1.4, 12);
    const overlay = geometryOverlay(g, 1e-6);
    expect(overlay.wallCount).toBe(2);
    expect(overlay.shapes.filter((s) => s.type === 'line')).toHaveLength(2);
    expect(overlay.annotations.map((a) => a.text)).toEqual(['wall bottom', 'wall top']);
    expect(Array.from(g.solidCells).every((v) => v === 0)).toBe(true);
  });
});
