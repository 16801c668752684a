// Minimal typing for the parts of jstat the tests use as a reference library.
declare module 'jstat' {
  interface ContinuousDistribution {
    cdf(x: number, ...parameters: number[]): number;
    inv(p: number, ...parameters: number[]): number;
    mean(...parameters: number[]): number;
    variance(...parameters: number[]): number;
  }
  export const jStat: {
    studentt: ContinuousDistribution;
    normal: ContinuousDistribution;
    uniform: ContinuousDistribution;
    triangular: ContinuousDistribution;
    arcsine: ContinuousDistribution;
    gammaln(x: number): number;
    ibeta(x: number, a: number, b: number): number;
  };
}
