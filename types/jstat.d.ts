// Minimal types for jstat 1.9 (the package ships none). jstat is a UMD/CommonJS module whose
// module.exports is the jStat function itself, so only the default import works in Node ESM:
//   import jStat from 'jstat';
// (`import { jStat } from 'jstat'` compiles in some bundlers but fails under Node, so it is
// deliberately not declared.) Add members here as the code needs them.
declare module 'jstat' {
  interface JStatContinuousDistribution {
    /** Probability density at x. */
    pdf(x: number, ...params: number[]): number;
    /** Cumulative distribution P(X <= x). */
    cdf(x: number, ...params: number[]): number;
    /** Quantile: the x with cdf(x) = p. */
    inv(p: number, ...params: number[]): number;
    mean(...params: number[]): number;
    variance(...params: number[]): number;
  }

  interface JStatStudentT {
    /** Density of Student's t with `dof` degrees of freedom. */
    pdf(x: number, dof: number): number;
    /** P(T <= x) for Student's t with `dof` degrees of freedom. */
    cdf(x: number, dof: number): number;
    /** Quantile of Student's t, e.g. inv(0.975, dof) for a two-sided 95 % interval. */
    inv(p: number, dof: number): number;
    mean(dof: number): number;
    variance(dof: number): number;
  }

  interface JStatChiSquare {
    pdf(x: number, dof: number): number;
    /** P(X <= x) for chi-square with `dof` degrees of freedom. */
    cdf(x: number, dof: number): number;
    inv(p: number, dof: number): number;
    mean(dof: number): number;
    variance(dof: number): number;
  }

  interface JStatNormal {
    pdf(x: number, mean: number, std: number): number;
    /** P(X <= x) for a normal distribution with the given mean and standard deviation. */
    cdf(x: number, mean: number, std: number): number;
    /** Quantile of the normal distribution. */
    inv(p: number, mean: number, std: number): number;
    mean(mean: number, std: number): number;
    variance(mean: number, std: number): number;
  }

  interface JStatGamma {
    pdf(x: number, shape: number, scale: number): number;
    cdf(x: number, shape: number, scale: number): number;
    inv(p: number, shape: number, scale: number): number;
  }

  interface JStatStatic {
    studentt: JStatStudentT;
    chisquare: JStatChiSquare;
    normal: JStatNormal;
    gamma: JStatGamma;
    beta: JStatContinuousDistribution;
    exponential: JStatContinuousDistribution;
    /** Gamma function Γ(x). */
    gammafn(x: number): number;
    /** Natural log of the gamma function, ln Γ(x). */
    gammaln(x: number): number;
    /** Regularised lower incomplete gamma function P(a, x). */
    lowRegGamma(a: number, x: number): number;
    /** Error function erf(x). */
    erf(x: number): number;
    /** Complementary error function erfc(x). */
    erfc(x: number): number;
    mean(values: ArrayLike<number>): number;
    stdev(values: ArrayLike<number>, sample?: boolean): number;
    variance(values: ArrayLike<number>, sample?: boolean): number;
  }

  const jStat: JStatStatic;
  export default jStat;
}
