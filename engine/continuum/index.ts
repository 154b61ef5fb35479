/**
 * Analytic continuum models of Tenuis (SI units throughout): mean free path definitions, slip and jump coefficients,
 * Couette, Fourier, force-driven Poiseuille, long pressure-driven ducts and the Beskok–Karniadakis unified model.
 * The cavity Navier–Stokes solver lives in ./cavity and has its own entry points.
 */
export * from './meanFreePath';
export * from './thermalConductivity';
export * from './gasState';
export * from './slipCoefficients';
export * from './profileSampling';
export * from './couette';
export * from './fourier';
export * from './poiseuille';
export * from './pressureDrivenDuct';
export * from './unifiedFlowModel';
