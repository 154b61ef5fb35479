/**
 * Physical constants and reference conditions, SI units.
 *
 * Source: the 2019 redefinition of the SI (BIPM, "The International System of Units", 9th edition, 2019), in which
 * k and N_A are exact by definition — published. Standard conditions for sccm: common practice (0 °C and one
 * standard atmosphere; some instrument makers use 20 °C or 25 °C instead, so a flow in sccm is only comparable when
 * its reference is stated).
 */

/** Boltzmann constant k, J/K. Exact by definition since 2019 (SI brochure, 9th ed.; published). */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

/** Avogadro constant N_A, 1/mol. Exact by definition since 2019 (SI brochure, 9th ed.; published). */
export const AVOGADRO_PER_MOL = 6.02214076e23;

/** Reference temperature of a standard cubic centimetre per minute, K (0 °C; common practice). */
export const SCCM_REFERENCE_TEMPERATURE_K = 273.15;

/** Reference pressure of a standard cubic centimetre per minute, Pa (one standard atmosphere, exact by definition). */
export const SCCM_REFERENCE_PRESSURE_PA = 101325;
