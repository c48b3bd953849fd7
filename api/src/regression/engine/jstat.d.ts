/**
 * Minimal typings for the parts of jStat the engine uses (the package ships no types).
 */
declare module 'jstat' {
  interface ContinuousDistribution {
    cdf(x: number, ...parameters: number[]): number;
    pdf(x: number, ...parameters: number[]): number;
    inv(p: number, ...parameters: number[]): number;
  }
  export const jStat: {
    normal: ContinuousDistribution;
    studentt: ContinuousDistribution;
    centralF: ContinuousDistribution;
    chisquare: ContinuousDistribution;
    gammaln(x: number): number;
    ibeta(x: number, a: number, b: number): number;
  };
}
