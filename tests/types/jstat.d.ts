// The slice of jStat's untyped API that the tests use as a second implementation.
declare module 'jstat' {
  interface OlsResult {
    coef: number[];
    t: { se: number[] };
    R2: number;
  }
  const jStat: {
    models: { ols(endog: number[], exog: number[][]): OlsResult };
    percentile(values: number[], k: number, exclusive?: boolean): number;
  };
  export default jStat;
}
