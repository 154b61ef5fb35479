/**
 * Table gases: molecular data for the VHS and VSS collision models.
 *
 * Source: Bird 1994, "Molecular Gas Dynamics and the Direct Simulation of Gas Flows", Appendix A (Tables A1–A3),
 * values FROM MEMORY (not re-read from the book), as copied in Tenuis's reference notes §5. They were checked
 * against Bird's VHS/VSS viscosity laws at T_ref = 273 K: the laws reproduce referenceViscosityPaS to within 0.3 %
 * for most gases, but only to 0.6 % for H2 (+0.59 %), CH4 (+0.47 %) and Ne (−0.35 % VHS, +0.54 % VSS) — more than
 * the rounding of d to three figures explains, so treat those rows with care. tests/unit/molecularModel.test.ts
 * pins these deviations.
 *
 * Air has no VSS row in the table: its VSS fields are null.
 */

export type SpeciesId = 'H2' | 'He' | 'Ne' | 'Ar' | 'Kr' | 'Xe' | 'N2' | 'O2' | 'air' | 'CO2' | 'CH4';

export interface SpeciesData {
  readonly id: SpeciesId;
  /** Plain-language name, e.g. 'argon'. */
  readonly name: string;
  /** Mass of one molecule, kg. */
  readonly massKg: number;
  /** Temperature at which the reference viscosity and diameters hold, K (273 K throughout Bird's table). */
  readonly referenceTemperatureK: number;
  /** Measured viscosity at referenceTemperatureK, Pa·s. */
  readonly referenceViscosityPaS: number;
  /** ω in μ ∝ T^ω (dimensionless). */
  readonly viscosityIndex: number;
  /** VHS reference diameter at referenceTemperatureK, m. */
  readonly vhsDiameterM: number;
  /** VSS reference diameter at referenceTemperatureK, m; null where the table has none (air). */
  readonly vssDiameterM: number | null;
  /** VSS scattering exponent α (dimensionless); null where the table has none (air). */
  readonly vssScatteringExponent: number | null;
  /** Rotational degrees of freedom ζ: 0 (monatomic), 2 (linear) or 3 (non-linear). */
  readonly rotationalDof: 0 | 2 | 3;
  readonly source: string;
}

const BIRD_1994_TABLE_A =
  'Bird 1994, Molecular Gas Dynamics and the Direct Simulation of Gas Flows, Appendix A (Tables A1–A3); from memory';

/** Bird's tables give m in 1e-27 kg, μ_ref in 1e-5 Pa·s and d in 1e-10 m; this helper converts them to SI once. */
function row(
  id: SpeciesId,
  name: string,
  rotationalDof: 0 | 2 | 3,
  mass1e27Kg: number,
  viscosity1e5PaS: number,
  viscosityIndex: number,
  vhsDiameter1e10M: number,
  vssScatteringExponent: number | null,
  vssDiameter1e10M: number | null,
): SpeciesData {
  return Object.freeze({
    id,
    name,
    massKg: mass1e27Kg * 1e-27,
    referenceTemperatureK: 273,
    referenceViscosityPaS: viscosity1e5PaS * 1e-5,
    viscosityIndex,
    vhsDiameterM: vhsDiameter1e10M * 1e-10,
    vssDiameterM: vssDiameter1e10M === null ? null : vssDiameter1e10M * 1e-10,
    vssScatteringExponent,
    rotationalDof,
    source: BIRD_1994_TABLE_A,
  });
}

// Columns as in the reference notes: id, name, ζ, m (1e-27 kg), μ_ref (1e-5 Pa·s), ω, d_VHS (1e-10 m), α_VSS, d_VSS.
export const SPECIES: Readonly<Record<SpeciesId, SpeciesData>> = Object.freeze({
  H2: row('H2', 'hydrogen', 2, 3.34, 0.845, 0.67, 2.92, 1.35, 2.88),
  He: row('He', 'helium', 0, 6.65, 1.865, 0.66, 2.33, 1.26, 2.3),
  Ne: row('Ne', 'neon', 0, 33.5, 2.975, 0.66, 2.77, 1.31, 2.72),
  Ar: row('Ar', 'argon', 0, 66.3, 2.117, 0.81, 4.17, 1.4, 4.11),
  Kr: row('Kr', 'krypton', 0, 139.1, 2.328, 0.8, 4.76, 1.32, 4.7),
  Xe: row('Xe', 'xenon', 0, 218.0, 2.107, 0.85, 5.74, 1.44, 5.65),
  N2: row('N2', 'nitrogen', 2, 46.5, 1.656, 0.74, 4.17, 1.36, 4.11),
  O2: row('O2', 'oxygen', 2, 53.12, 1.919, 0.77, 4.07, 1.4, 4.01),
  air: row('air', 'air', 2, 48.1, 1.719, 0.77, 4.19, null, null),
  CO2: row('CO2', 'carbon dioxide', 2, 73.1, 1.38, 0.93, 5.62, 1.61, 5.54),
  CH4: row('CH4', 'methane', 3, 26.63, 1.024, 0.84, 4.83, 1.6, 4.78),
});

/** All table gases, in table order; a tuple type so that it can feed z.enum() directly. */
export const SPECIES_IDS = Object.freeze([
  'H2',
  'He',
  'Ne',
  'Ar',
  'Kr',
  'Xe',
  'N2',
  'O2',
  'air',
  'CO2',
  'CH4',
] as const satisfies readonly SpeciesId[]);
