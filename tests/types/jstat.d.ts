/** The few parts of the independent `jstat` package (no bundled types) that the reference tests use. */
declare module "jstat" {
  interface Distribution {
    cdf(x: number, a: number, b: number): number;
    inv(p: number, a: number, b: number): number;
  }
  const jStat: {
    normal: Distribution;
    lognormal: Distribution;
  };
  export default jStat;
}
