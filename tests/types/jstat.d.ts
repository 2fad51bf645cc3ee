// The slice of jStat's untyped API that the tests use as a second implementation.
declare module 'jstat' {
  interface OlsResult {
    coef: number[];
    t: { se: number[] };
    R2: number;
  }
  const jStat: {
    models: { ols(endog: number[], exog: number[][]): OlsResult };
  };
  export default jStat;
}
