// Types for the few jStat functions the sampling specs cross-check against (jstat ships none).
// Only the specs import jstat; it is a devDependency of core.
declare module 'jstat' {
  export const jStat: {
    binomial: { cdf(k: number, n: number, p: number): number };
    hypgeom: { cdf(k: number, population: number, marked: number, drawn: number): number };
    beta: { inv(probability: number, alpha: number, beta: number): number };
  };
}
