/**
 * Long pressure-driven channel and tube, isothermal and locally fully developed (inertia neglected, L ≫ H or R):
 * mass flow rate and pressure along the duct, for no slip, first- and second-order slip.
 *
 * Local flow rate (from poiseuille.ts with −dp/dx for ρa), Kn = λ/H or λ/R, λ the viscosity mean free path:
 *   channel ṁ = (ρ H³ W/(12μ)) (1 + 6a1 Kn + 12a2 Kn²)(−dp/dx),
 *   tube    ṁ = (ρ π R⁴/(8μ))  (1 + 4a1 Kn + 4a2 Kn²)(−dp/dx).
 * At fixed T, λ ∝ 1/p, so Kn = Kn_o/P with P = p/p_o and Kn_o the outlet Knudsen number, and ρ = p/(R_g T). The
 * local rate becomes ṁ = K p_o² (P + A + B/P)(−dP/dx) with
 *   channel K = H³W/(12 μ R_g T), A = 6a1 Kn_o, B = 12a2 Kn_o²;   tube K = πR⁴/(8 μ R_g T), A = 4a1 Kn_o, B = 4a2 Kn_o².
 * ṁ is the same at every x (steady, no leaks), so integrating from x to L with F(P) = P²/2 + A P + B ln P:
 *   ṁ (L − x) = K p_o² [F(P(x)) − F(1)],   ṁ = (K p_o²/L) [F(Π) − F(1)],  Π = p_in/p_out.
 * First order (B = 0) this is Arkilic, Schmidt & Breuer 1997 (J. MEMS 6:167; formula from memory, reference notes
 * §7): ṁ = (H³W p_o²/(24 μ R_g T L)) [(Π² − 1) + 12 ((2 − σ)/σ) Kn_o (Π − 1)] for Maxwell slip, and its tube analogue
 * (derived here the same way) ṁ = (πR⁴ p_o²/(16 μ R_g T L)) [(Π² − 1) + 8 a1 Kn_o (Π − 1)], Kn_o = λ_o/R. No slip gives
 * the compressible Poiseuille laws (Π² − 1) alone. Second order adds 2B ln Π inside the brackets (derived here).
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { viscosityMeanFreePath } from './meanFreePath';
import { slipLengthCoefficients, type ContinuumSlipModel, type VelocitySlipKind } from './slipCoefficients';

export type DuctGeometry =
  | {
      readonly kind: 'channel';
      /** H, gap between the plates, m (the Knudsen number is on H). */
      readonly heightM: number;
      /** W, m (W ≫ H: side walls neglected). */
      readonly widthM: number;
      /** L, m. */
      readonly lengthM: number;
    }
  | {
      readonly kind: 'tube';
      /** R, m (the Knudsen number is on R). */
      readonly radiusM: number;
      /** L, m. */
      readonly lengthM: number;
    };

export interface PressureDrivenDuctInput {
  /** μ in Pa·s at temperatureK (K), molecular mass in kg. */
  readonly gas: { readonly viscosityPaS: number; readonly massKg: number; readonly temperatureK: number };
  readonly geometry: DuctGeometry;
  /** p_in at x = 0, Pa. */
  readonly inletPressurePa: number;
  /** p_out at x = L, Pa. */
  readonly outletPressurePa: number;
  readonly slip: ContinuumSlipModel;
  /** Maxwell tangential-momentum accommodation σ of the walls, (0, 1]; default 1 (diffuse). */
  readonly accommodation?: number;
}

export interface PressureDrivenDuctFlow {
  readonly slip: VelocitySlipKind;
  /** ṁ through the whole duct, kg/s (channel: over its width W); negative if p_in < p_out. */
  readonly massFlowRateKgPerS: number;
  /** Π = p_in/p_out. */
  readonly pressureRatio: number;
  /** Kn_o = λ(p_out)/H or λ(p_out)/R. */
  readonly outletKnudsen: number;
  /** p(x), Pa, x in m from the inlet (0 ≤ x ≤ L). */
  readonly pressurePa: (xM: number) => number;
  /** Cross-section mean velocity ṁ/(ρ(x)·area), m/s, x in m from the inlet. */
  readonly meanVelocityMPerS: (xM: number) => number;
}

function requirePositive(value: number, what: string): void {
  if (!(Number.isFinite(value) && value > 0)) throw new Error(`${what} = ${value}: must be a finite number > 0`);
}

/**
 * Solves F(P) = P²/2 + A P + B ln P = target for P between lo and hi (F is increasing for P > 0 as A, B ≥ 0):
 * the quadratic root when B = 0, otherwise Newton steps kept inside the bracket by bisection.
 */
function solvePressureRatio(a: number, b: number, target: number, lo: number, hi: number): number {
  if (b === 0) return -a + Math.sqrt(a * a + 2 * target);
  let low = Math.min(lo, hi);
  let high = Math.max(lo, hi);
  let p = (low + high) / 2;
  for (let i = 0; i < 200; i++) {
    const residual = (p * p) / 2 + a * p + b * Math.log(p) - target;
    if (residual > 0) high = p;
    else low = p;
    const next = p - residual / (p + a + b / p);
    const stepped = next > low && next < high ? next : (low + high) / 2;
    if (Math.abs(stepped - p) <= 1e-15 * p) return stepped;
    p = stepped;
  }
  return p;
}

/**
 * Mass flow rate and pressure distribution of a long isothermal duct (units in PressureDrivenDuctInput; formulas
 * and sources in the file header).
 */
export function pressureDrivenDuctFlow(input: PressureDrivenDuctInput): PressureDrivenDuctFlow {
  const { gas, geometry, inletPressurePa: pin, outletPressurePa: pout, slip } = input;
  requirePositive(gas.viscosityPaS, 'gas viscosity (Pa·s)');
  requirePositive(gas.massKg, 'molecular mass (kg)');
  requirePositive(gas.temperatureK, 'gas temperature (K)');
  requirePositive(pin, 'inlet pressure (Pa)');
  requirePositive(pout, 'outlet pressure (Pa)');
  requirePositive(geometry.lengthM, 'duct length (m)');
  const { first, second } = slipLengthCoefficients(slip, input.accommodation ?? 1);
  const gasConstant = K_B / gas.massKg;
  const lambdaOut = viscosityMeanFreePath(gas.viscosityPaS, pout, gas.temperatureK, gas.massKg);

  let k: number;
  let a: number;
  let b: number;
  let knOut: number;
  let areaM2: number;
  if (geometry.kind === 'channel') {
    const { heightM: h, widthM: w } = geometry;
    requirePositive(h, 'channel height (m)');
    requirePositive(w, 'channel width (m)');
    knOut = lambdaOut / h;
    k = (h * h * h * w) / (12 * gas.viscosityPaS * gasConstant * gas.temperatureK);
    a = 6 * first * knOut;
    b = 12 * second * knOut * knOut;
    areaM2 = h * w;
  } else {
    const r = geometry.radiusM;
    requirePositive(r, 'tube radius (m)');
    knOut = lambdaOut / r;
    k = (Math.PI * r * r * r * r) / (8 * gas.viscosityPaS * gasConstant * gas.temperatureK);
    a = 4 * first * knOut;
    b = 4 * second * knOut * knOut;
    areaM2 = Math.PI * r * r;
  }

  const big = (p: number) => (p * p) / 2 + a * p + b * Math.log(p);
  const ratio = pin / pout;
  const fIn = big(ratio);
  const fOut = big(1);
  const length = geometry.lengthM;
  const massFlow = ((k * pout * pout) / length) * (fIn - fOut);
  const pressurePa = (x: number) => {
    // F is linear in x between its inlet and outlet values; the ends are returned exactly.
    if (x <= 0) return pin;
    if (x >= length) return pout;
    return pout * solvePressureRatio(a, b, fIn - (x / length) * (fIn - fOut), 1, ratio);
  };
  return {
    slip: slip.kind,
    massFlowRateKgPerS: massFlow,
    pressureRatio: ratio,
    outletKnudsen: knOut,
    pressurePa,
    meanVelocityMPerS: (x) => (massFlow * gasConstant * gas.temperatureK) / (pressurePa(x) * areaM2),
  };
}
