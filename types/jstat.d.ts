/** The part of jStat (npm `jstat`, no bundled types) that Leeway uses. */
declare module 'jstat' {
  export const jStat: {
    chisquare: { inv(p: number, dof: number): number; cdf(x: number, dof: number): number };
    normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
    binomial: { pdf(k: number, n: number, p: number): number; cdf(k: number, n: number, p: number): number };
  };
}
