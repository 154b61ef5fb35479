/**
 * The entrance and exit of a tube between vessels, as a conductance in series with the long tube
 * (1/C = 1/C_long + 1/C_end), from two published limits added the way vacuum practice adds viscous and molecular
 * conductances:
 * - free-molecular: Santeler's fit to Clausing's transmission probabilities (D. J. Santeler 1986, J. Vac. Sci.
 *   Technol. A 4:338), 1/W = 1 + (3L/8R)·(1 + 1/(3(1 + L/(7R)))). Its excess over the long-tube 3L/(8R) is the end
 *   resistance: 1/W_end = 1 + (3L/8R)/(3(1 + L/(7R))), i.e. C_end = W_end·πR²·c̄/4;
 * - viscous creeping flow: Sampson's orifice resistance, Q_volume = R³Δp/(3μ) (Sampson 1891), which added to
 *   Poiseuille's gives the flow through a finite tube to about 1 % (Dagan, Weinbaum & Pfeffer 1982, J. Fluid Mech.
 *   115:505; from memory): C_end = p̄·R³/(3μ).
 * Between the limits the sum is an estimate; its size is reported with every result.
 */
import { meanSpeedMPerS, viscosityPaS, type MolecularModel } from '../gas/molecularModel';

export function tubeEndConductanceM3PerS(
  tube: { readonly radiusM: number; readonly lengthM: number },
  gas: MolecularModel,
  temperatureK: number,
  meanPressurePa: number,
): number {
  const r = tube.radiusM;
  const ratio = tube.lengthM / r;
  const inverseEnd = 1 + (3 * ratio) / 8 / (3 * (1 + ratio / 7));
  const molecular = (Math.PI * r * r * meanSpeedMPerS(gas.massKg, temperatureK)) / 4 / inverseEnd;
  const viscous = (meanPressurePa * r ** 3) / (3 * viscosityPaS(gas, temperatureK));
  return molecular + viscous;
}
