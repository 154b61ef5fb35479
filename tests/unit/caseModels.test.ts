/**
 * caseModelsOf(plan): which analytic problem a case is, and the predictions against the closed forms they come from
 * (Sharipov & Seleznev 1998 normalization; reference notes §2, §3, §6, §7 — formulas restated beside each check).
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { planOrThrow } from '../support/planOrThrow';
import { caseModelsOf } from '../../engine/continuum/caseModels';
import type { CaseModels } from '../../engine/continuum/caseModelTypes';
import { BOLTZMANN_J_PER_K as K_B } from '../../engine/physics/constants';
import { MAXWELL_SLIP } from '../../engine/continuum/slipCoefficients';

function models(name: string, overrides: Record<string, string> = {}, options = {}): CaseModels {
  const m = caseModelsOf(planOrThrow(buildPreset(name, overrides)), options);
  if (!m.recognised) throw new Error(m.reason);
  return m;
}

const value = (m: CaseModels, key: string, model: string) =>
  (m.quantities.find((q) => q.key === key)?.values as Record<string, number>)[model];
const profile = (m: CaseModels, key: string) => m.profiles.find((p) => p.key === key)!;

describe('caseModelsOf()', () => {
  it('Couette: τ = μU/H without slip, μU/(H + 2·1.1466λ) with kinetic first-order slip, Π = 1/√π free-molecular; each wall gets τU/2', () => {
    const plan = planOrThrow(buildPreset('couette', { knudsen: '0.1', wallSpeed: '100m/s' }));
    const m = caseModelsOf(plan);
    if (!m.recognised) throw new Error(m.reason);
    const { viscosityPaS: mu, meanFreePathM: lambda, pressurePa: p, mostProbableSpeedMPerS: v0 } = plan.reference;
    const h = plan.grid.lengthYM;
    expect(m.problem).toBe('couette');
    expect(m.meanFreePath.kind).toBe('viscosity');
    expect(value(m, 'walls.bottom.shearStress', 'noSlip')).toBeCloseTo((mu * 100) / h, 10);
    // σ_P = 1.0162 ℓ = 1.0162·(2/√π) λ = 1.1466 λ (reference notes §6).
    expect(
      value(m, 'walls.bottom.shearStress', 'firstOrder') /
        ((mu * 100) / (h + 2 * 1.0162 * (2 / Math.sqrt(Math.PI)) * lambda)),
    ).toBeCloseTo(1, 12);
    expect(value(m, 'walls.top.shearStress', 'firstOrder')).toBe(-value(m, 'walls.bottom.shearStress', 'firstOrder'));
    expect((value(m, 'walls.bottom.shearStress', 'freeMolecular') * v0) / (p * 100)).toBeCloseTo(
      1 / Math.sqrt(Math.PI),
      12,
    );
    for (const model of ['noSlip', 'firstOrder', 'secondOrder', 'freeMolecular']) {
      expect(value(m, 'walls.top.heatFlux', model)).toBeCloseTo(
        (value(m, 'walls.bottom.shearStress', model) * 100) / 2,
        9,
      );
    }
    const u = profile(m, 'profile.velocityX');
    expect(u.positionsM).toHaveLength(plan.grid.cellsY);
    expect(u.positionsM[0]).toBeCloseTo(plan.grid.cellSizeYM / 2, 15);
    // Antisymmetric about the middle, slope τ/μ.
    const n = u.positionsM.length;
    expect(u.values.firstOrder![0] + u.values.firstOrder![n - 1]).toBeCloseTo(0, 9);
    expect((u.values.firstOrder![1] - u.values.firstOrder![0]) / plan.grid.cellSizeYM).toBeCloseTo(
      value(m, 'walls.bottom.shearStress', 'firstOrder') / mu,
      6,
    );
  });

  it('Couette with MAXWELL_SLIP: slip length λ; with a Maxwell wall of accommodation 0.8 the factor (2 − σ)/σ', () => {
    const plan = planOrThrow(buildPreset('couette', { knudsen: '0.1' }));
    const m = caseModelsOf(plan, { firstOrder: MAXWELL_SLIP });
    if (!m.recognised) throw new Error(m.reason);
    const { viscosityPaS: mu, meanFreePathM: lambda } = plan.reference;
    const h = plan.grid.lengthYM;
    const u = 100;
    expect(value(m, 'walls.bottom.shearStress', 'firstOrder')).toBeCloseTo((mu * u) / (h + 2 * lambda), 10);
    const c = structuredClone(plan.caseData);
    for (const side of ['bottom', 'top'] as const)
      Object.assign(c.boundaries[side], { model: 'maxwell', accommodation: 0.8 });
    const maxwell = caseModelsOf(planOrThrow(c), { firstOrder: MAXWELL_SLIP });
    if (!maxwell.recognised) throw new Error(maxwell.reason);
    expect(value(maxwell, 'walls.bottom.shearStress', 'firstOrder')).toBeCloseTo(
      (mu * u) / (h + 2 * (1.2 / 0.8) * lambda),
      10,
    );
  });

  it('Couette temperature: κT″ = −μ(τ/μ)² across the gap, the Smoluchowski jump only with slip', () => {
    const plan = planOrThrow(buildPreset('couette', { knudsen: '0.1', wallSpeed: '200m/s' }));
    const m = caseModelsOf(plan) as CaseModels;
    const t = profile(m, 'profile.temperature');
    const dy = plan.grid.cellSizeYM;
    const mu = plan.reference.viscosityPaS;
    const kappa = (15 / 4) * (K_B / plan.gas.model.massKg) * mu; // monatomic Eucken (Chapman–Enskog)
    for (const model of ['noSlip', 'firstOrder'] as const) {
      const v = t.values[model]!;
      const second = (v[2] - 2 * v[1] + v[0]) / (dy * dy);
      const b = value(m, 'walls.bottom.shearStress', model) / mu;
      expect((kappa * second) / (-mu * b * b)).toBeCloseTo(1, 6);
    }
    // No slip: the gas at the wall (extrapolated by the parabola) has the wall temperature.
    const v = t.values.noSlip!;
    const c = v.length / 2;
    const curvature = (v[2] - 2 * v[1] + v[0]) / (dy * dy);
    const centre = (v[c - 1] + v[c]) / 2 - (curvature / 2) * (dy / 2) ** 2;
    expect(centre + (curvature / 2) * (plan.grid.lengthYM / 2) ** 2).toBeCloseTo(273, 9);
  });

  it('Fourier: q = κΔT/(H + 2j), the bottom wall receives −q_y, the top +q_y; free-molecular q* = 1', () => {
    const plan = planOrThrow(buildPreset('fourier', { knudsen: '0.1' }));
    const m = caseModelsOf(plan) as CaseModels;
    expect(m.problem).toBe('fourier');
    const mu = plan.reference.viscosityPaS;
    const kappa = (15 / 4) * (K_B / plan.gas.model.massKg) * mu;
    const h = plan.grid.lengthYM;
    // Cold bottom (263 K), hot top (283 K): heat flows down, into the bottom wall.
    expect(value(m, 'walls.bottom.heatFlux', 'noSlip')).toBeCloseTo((kappa * 20) / h, 9);
    expect(value(m, 'walls.top.heatFlux', 'noSlip')).toBe(-value(m, 'walls.bottom.heatFlux', 'noSlip'));
    // Smoluchowski j = (2γ/(γ+1))λ/Pr = (5/4)(3/2)λ for a monatomic gas (reference notes §6).
    expect(value(m, 'walls.bottom.heatFlux', 'firstOrder')).toBeCloseTo(
      (kappa * 20) / (h + 2 * 1.875 * plan.reference.meanFreePathM),
      9,
    );
    const { pressurePa: p, mostProbableSpeedMPerS: v0, temperatureK: t0 } = plan.reference;
    expect((value(m, 'walls.bottom.heatFlux', 'freeMolecular') * Math.sqrt(Math.PI) * t0) / (p * v0 * 20)).toBeCloseTo(
      1,
      9,
    );
    expect(m.models.secondOrder).toBeUndefined();
  });

  it('force-driven channel: G_P = δ/6 no slip, δ/6 + σ_P first order (reference notes §2); wall shear ρaH/2 and heat a·ṁ′/2', () => {
    const plan = planOrThrow(buildPreset('poiseuille', { knudsen: '0.1' }));
    const m = caseModelsOf(plan) as CaseModels;
    expect(m.problem).toBe('forceDrivenChannel');
    const delta = plan.reference.rarefaction;
    expect(value(m, 'flow.reducedFlowRate', 'noSlip')).toBeCloseTo(delta / 6, 10);
    expect(value(m, 'flow.reducedFlowRate', 'firstOrder')).toBeCloseTo(delta / 6 + 1.0162, 10);
    expect(value(m, 'flow.reducedFlowRate', 'unified')).toBeGreaterThan(delta / 6);
    expect(value(m, 'flow.reducedFlowRate', 'freeMolecular')).toBeUndefined();
    const a = plan.bodyAccelerationXMPerS2;
    const rho = plan.reference.massDensityKgPerM3;
    expect(value(m, 'walls.top.shearStress', 'secondOrder')).toBeCloseTo((rho * a * plan.grid.lengthYM) / 2, 6);
    expect(value(m, 'walls.bottom.heatFlux', 'firstOrder')).toBeCloseTo(
      (a * value(m, 'flow.massFlowRate', 'firstOrder')) / 2,
      6,
    );
    // The temperature profile peaks in the middle and does not depend on the slip model beyond the jump.
    const t = profile(m, 'profile.temperature').values.firstOrder!;
    const mid = t.length / 2;
    expect(t[mid]).toBeGreaterThan(t[0]);
    expect(t[mid - 1]).toBeCloseTo(t[mid], 12);
  });

  it('force-driven tube: G_P = δ/4 no slip and 8/(3√π) free-molecular (reference notes §3)', () => {
    const c = structuredClone(planOrThrow(buildPreset('poiseuille', { knudsen: '0.5' })).caseData);
    c.domain.geometry = 'axisymmetric';
    c.boundaries.bottom = { type: 'axis' };
    delete (c as { flowReport?: unknown }).flowReport;
    const plan = planOrThrow(c);
    const m = caseModelsOf(plan) as CaseModels;
    expect(m.problem).toBe('forceDrivenTube');
    expect(value(m, 'flow.reducedFlowRate', 'noSlip')).toBeCloseTo(plan.reference.rarefaction / 4, 10);
    expect(value(m, 'flow.reducedFlowRate', 'freeMolecular')).toBeCloseTo(8 / (3 * Math.sqrt(Math.PI)), 12);
    expect(value(m, 'walls.top.shearStress', 'noSlip')).toBeCloseTo(
      (plan.reference.massDensityKgPerM3 * plan.bodyAccelerationXMPerS2 * plan.grid.lengthYM) / 2,
      6,
    );
  });

  it('long channel between vessels: no-slip ṁ = H³p_o²(Π² − 1)/(24μRTL) per metre (Arkilic et al. 1997 with Kn = 0); G_P scaled as the DSMC one', () => {
    const plan = planOrThrow(buildPreset('channel', { knudsen: '0.05', pressureRatio: '3' }));
    const m = caseModelsOf(plan) as CaseModels;
    expect(m.problem).toBe('pressureDrivenChannel');
    const r = plan.caseData.flowReport!;
    const left = plan.caseData.boundaries.left as { pressurePa: number; temperatureK: number };
    const right = plan.caseData.boundaries.right as { pressurePa: number };
    const t = left.temperatureK;
    const mu = plan.reference.viscosityPaS;
    const gasConstant = K_B / plan.gas.model.massKg;
    const ratio = left.pressurePa / right.pressurePa;
    const expected =
      (r.sizeM ** 3 * right.pressurePa ** 2 * (ratio * ratio - 1)) / (24 * mu * gasConstant * t * r.lengthM!);
    expect(value(m, 'flow.massFlowRate', 'noSlip') / expected).toBeCloseTo(1, 10);
    const v0 = Math.sqrt((2 * K_B * t) / plan.gas.model.massKg);
    expect(value(m, 'flow.reducedFlowRate', 'noSlip')).toBeCloseTo(
      (expected * v0 * r.lengthM!) / (r.sizeM ** 2 * (left.pressurePa - right.pressurePa)),
      10,
    );
    const order = ['noSlip', 'firstOrder', 'secondOrder'].map((k) => value(m, 'flow.massFlowRate', k));
    expect(order[0]).toBeLessThan(order[1]);
    expect(order[1]).toBeLessThan(order[2]);
    expect(m.profiles).toEqual([]);
  });

  it('long tube between vessels: the unified model tends to Knudsen’s 8/(3√π) when rarefied, as does the free-molecular limit', () => {
    const m = models('tube', { knudsen: '50', pressureRatio: '1.2' });
    expect(m.problem).toBe('pressureDrivenTube');
    expect(value(m, 'flow.reducedFlowRate', 'freeMolecular')).toBeCloseTo(8 / (3 * Math.sqrt(Math.PI)), 10);
    expect(value(m, 'flow.reducedFlowRate', 'unified') / (8 / (3 * Math.sqrt(Math.PI)))).toBeCloseTo(1, 1);
  });

  it('cavity: Re = ρUL/μ of the reference state, centreline profiles at the cell centres, the lid speed as scale', () => {
    const plan = planOrThrow(buildPreset('cavity', { knudsen: '0.1', lidSpeed: '100m/s', cells: '20' }));
    const m = caseModelsOf(plan) as CaseModels;
    expect(m.problem).toBe('cavity');
    const re = (plan.reference.massDensityKgPerM3 * 100 * plan.grid.lengthXM) / plan.reference.viscosityPaS;
    expect(m.description).toContain(`Re = ${re.toPrecision(4)}`);
    const u = profile(m, 'centerline.x.velocityX');
    const v = profile(m, 'centerline.y.velocityY');
    expect(u.line).toEqual({ kind: 'column', atM: plan.grid.lengthXM / 2 });
    expect(u.positionsM).toHaveLength(20);
    expect(u.scale).toMatchObject({ kind: 'fixed', value: 100 });
    // Near the lid the gas moves with it (less with slip); below the vortex centre it flows back.
    expect(u.values.noSlip![19]).toBeGreaterThan(u.values.firstOrder![19]);
    expect(u.values.noSlip![19]).toBeGreaterThan(50);
    expect(Math.min(...u.values.noSlip!)).toBeLessThan(0);
    expect(v.values.noSlip).toHaveLength(20);
  });

  it('says why when no model applies', () => {
    const reason = (name: string, o: Record<string, string> = {}) => {
      const m = caseModelsOf(planOrThrow(buildPreset(name, o)));
      return m.recognised ? '' : m.reason;
    };
    expect(reason('couette', { wallSpeed: '0' })).toMatch(/equilibrium/);
    expect(reason('slit')).toMatch(/blocks/);
    expect(reason('orifice')).toMatch(/blocks|axisymmetric/);
    const c = structuredClone(planOrThrow(buildPreset('couette')).caseData);
    c.boundaries.top = { ...c.boundaries.top, model: 'specular' } as typeof c.boundaries.top;
    const m = caseModelsOf(planOrThrow(c));
    expect(m.recognised ? '' : m.reason).toMatch(/specular walls have no counterpart/);
  });
});
