/**
 * Keys of the integral-quantity series (one value per base batch): each wall's WALL_QUANTITIES as `WALL.QUANTITY`,
 * and each flow section's mass flow rate as `section.NAME.massFlowRate`. One list, so the simulation, sample files
 * and checkpoints agree on what a run records.
 */
import { WALL_QUANTITIES } from './wallQuantities';

export const SECTION_SERIES_PREFIX = 'section.';
export const SECTION_QUANTITY = 'massFlowRate';

export function sectionSeriesKey(section: string): string {
  return `${SECTION_SERIES_PREFIX}${section}.${SECTION_QUANTITY}`;
}

export function seriesKeysOf(wallNames: readonly string[], sectionNames: readonly string[]): string[] {
  return [...wallNames.flatMap((w) => WALL_QUANTITIES.map((q) => `${w}.${q}`)), ...sectionNames.map(sectionSeriesKey)];
}
