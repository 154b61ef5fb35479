/**
 * The name a saved run is listed under, built from the case that was actually run — geometry, gas, size with its
 * unit, Knudsen number and, for a flow between vessels, the pressures — so two runs of one example with different
 * inputs can be told apart, and a case edited away from its example is not listed under the example's title.
 * Pure over the case input (trusted: it has been validated and run), so it is unit-tested without a browser.
 */
import type { CaseInput } from '../../engine/case/schema';
import { lengthUnitFor, sig } from '../format';

/** The duct's size as named in the preset forms: the radius of a tube or orifice, the gap of a channel or slit. */
const SIZE_WORD: Readonly<Record<string, string>> = { tube: 'R', orifice: 'R', channel: 'H', slit: 'H' };

function lengthText(m: number): string {
  const { unit, factor } = lengthUnitFor(m);
  return `${sig(m / factor, 3)} ${unit}`;
}

function pressureText(pa: number): string {
  return pa >= 1e3 ? `${sig(pa / 1e3, 3)} kPa` : `${sig(pa, 3)} Pa`;
}

/** E.g. "tube, N2, R 2 mm, L 10 mm, Kn 0.5, 8.68 → 4.34 Pa"; the time of the run is added by the caller. */
export function runNameOf(c: CaseInput, knudsen: number, presetName?: string): string {
  const parts: string[] = [];
  const report = c.flowReport;
  const axisymmetric = c.domain.geometry === 'axisymmetric';
  parts.push(report?.duct ?? (presetName || (axisymmetric ? 'axisymmetric case' : 'planar case')));
  parts.push(c.gas.species ?? c.gas.custom?.name ?? 'gas');
  if (report) {
    parts.push(`${SIZE_WORD[report.duct] ?? 'size'} ${lengthText(report.sizeM)}`);
    if (report.lengthM !== undefined) parts.push(`L ${lengthText(report.lengthM)}`);
  } else if (c.domain.characteristicLengthM !== undefined) {
    parts.push(`L ${lengthText(c.domain.characteristicLengthM)}`);
  }
  if (Number.isFinite(knudsen)) parts.push(`Kn ${sig(knudsen, 3)}`);
  const left = c.boundaries.left;
  const right = c.boundaries.right;
  if (left.type === 'reservoir' && right.type === 'reservoir')
    parts.push(`${pressureText(left.pressurePa)} → ${pressureText(right.pressurePa)}`);
  else if (left.type === 'reservoir') parts.push(pressureText(left.pressurePa));
  return parts.join(', ');
}
