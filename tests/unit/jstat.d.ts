// Minimal types for the parts of jstat (no bundled types) that the limits tests use as a reference.
declare module "jstat" {
  interface JStatStatic {
    chisquare: { inv(p: number, dof: number): number; cdf(x: number, dof: number): number };
    gammaln(x: number): number;
  }
  const jStat: JStatStatic;
  export default jStat;
}
