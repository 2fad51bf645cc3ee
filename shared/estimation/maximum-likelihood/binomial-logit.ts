import { EstimationError } from '../estimation-error';
import { CompensatedSum } from '../least-squares/compensated-dot';
import { assertLogitOverlap } from './logit-overlap';
import { maximiseLogLikelihood, type LogLikelihoodPoint } from './newton-maximiser';

/** Observations for a logit P(y = 1 | x) = 1 / (1 + exp(−(a + b·x))). */
export interface BinomialLogitData {
  readonly x: readonly number[];
  /** Outcome in [0, 1]: 0/1 answers, or a calibrated purchase probability (fractional logit). */
  readonly y: readonly number[];
  /** Case weights; default 1. */
  readonly weights?: readonly number[];
  /** Cluster labels (e.g. respondent) for the cluster-robust covariance; none: one per row. */
  readonly clusters?: readonly (string | number)[];
  /**
   * Respondents each cluster stands for (per row, the same on every row of a cluster; default
   * 1): a cluster of m identical respondents whose rows carry m times one respondent's weight.
   * Its score is m·s, and the m respondents add m·s·sᵀ = (m·s)(m·s)ᵀ/m to the meat.
   */
  readonly clusterSizes?: readonly number[];
}

export interface BinomialLogitFit {
  readonly intercept: number;
  readonly slope: number;
  /** Σ w·[y·log P + (1 − y)·log(1 − P)] (no binomial constant). */
  readonly logLikelihood: number;
  /** Inverse information (−H)⁻¹, order [intercept, slope]. */
  readonly modelCovariance: number[][];
  /** Sandwich H⁻¹(Σ_g s_g s_gᵀ)H⁻¹ · G/(G − 1) over clusters. */
  readonly robustCovariance: number[][];
  readonly clusterCount: number;
  readonly iterations: number;
}

/** log(1 + eᶻ) without overflow. */
export const softplus = (z: number): number =>
  z > 0 ? z + Math.log1p(Math.exp(-z)) : Math.log1p(Math.exp(z));

/** The logistic function 1 / (1 + e^−z). */
export const logistic = (z: number): number =>
  z >= 0 ? 1 / (1 + Math.exp(-z)) : Math.exp(z) / (1 + Math.exp(z));

/**
 * Maximum-likelihood logit with one regressor by Newton–Raphson (= IRLS for the canonical link).
 * Refuses separated data ('no-finite-estimate') before iterating.
 */
export function fitBinomialLogit(data: BinomialLogitData, field = 'x'): BinomialLogitFit {
  const { x, y } = data;
  const w = data.weights ?? x.map(() => 1);
  assertLogitOverlap(
    x,
    y.map((yi, i) => w[i] * yi),
    y.map((yi, i) => w[i] * (1 - yi)),
    field,
  );
  const evaluate = (params: readonly number[]) => logitLogLikelihood(params, x, y, w);
  const ybar = y.reduce((s, v, i) => s + w[i] * v, 0) / w.reduce((s, v) => s + v, 0);
  const fit = maximiseLogLikelihood(evaluate, [Math.log(ybar / (1 - ybar)), 0], field);
  const [intercept, slope] = fit.params;
  const robust = clusterSandwich(data, w, intercept, slope);
  return {
    intercept,
    slope,
    logLikelihood: fit.logLikelihood,
    modelCovariance: fit.inverseInformation,
    robustCovariance: robust.covariance,
    clusterCount: robust.clusters,
    iterations: fit.iterations,
  };
}

/** Σ w·[y·log P + (1 − y)·log(1 − P)] with its gradient and Hessian in (a, b). */
function logitLogLikelihood(
  [a, b]: readonly number[],
  x: readonly number[],
  y: readonly number[],
  w: readonly number[],
): LogLikelihoodPoint {
  let value = 0;
  const g = [0, 0];
  const h = [
    [0, 0],
    [0, 0],
  ];
  x.forEach((xi, i) => {
    const eta = a + b * xi;
    const p = logistic(eta);
    value -= w[i] * (y[i] * softplus(-eta) + (1 - y[i]) * softplus(eta));
    const r = w[i] * (y[i] - p);
    const v = w[i] * p * (1 - p);
    g[0] += r;
    g[1] += r * xi;
    h[0][0] -= v;
    h[0][1] -= v * xi;
    h[1][1] -= v * xi * xi;
  });
  h[1][0] = h[0][1];
  return { value, gradient: g, hessian: h };
}

/**
 * The cluster-robust sandwich, formed about the information-weighted mean price m: in the
 * coordinates (a + b·m, b) the information matrix is diagonal up to rounding, so the bread
 * inverts without loss and the meat's roundings are not amplified by the conditioning that
 * prices far from zero give [1, x]; the result is carried back by A·V·Aᵀ, A = [[1, −m], [0, 1]].
 * `bread` (the Newton step's inverse information) is not used for that reason. Sums are
 * accumulated in double-double.
 */
function clusterSandwich(
  data: BinomialLogitData,
  w: readonly number[],
  a: number,
  b: number,
): { covariance: number[][]; clusters: number } {
  const p = data.x.map((xi) => logistic(a + b * xi));
  const information = new CompensatedSum();
  const moment = new CompensatedSum();
  p.forEach((pi, i) => {
    const v = w[i] * pi * (1 - pi);
    information.add(v);
    moment.addProduct(v, data.x[i]);
  });
  const m = moment.value() / information.value();
  const c = data.x.map((xi) => xi - m);
  const h = [new CompensatedSum(), new CompensatedSum(), new CompensatedSum()];
  const scores = new Map<string | number, [CompensatedSum, CompensatedSum, number]>();
  p.forEach((pi, i) => {
    const v = w[i] * pi * (1 - pi);
    h[0].add(v);
    h[1].addProduct(v, c[i]);
    h[2].addProduct(v * c[i], c[i]);
    const key = data.clusters?.[i] ?? i;
    const r = w[i] * (data.y[i] - pi);
    let score = scores.get(key);
    if (!score) {
      score = [new CompensatedSum(), new CompensatedSum(), data.clusterSizes?.[i] ?? 1];
      scores.set(key, score);
    }
    score[0].add(r);
    score[1].addProduct(r, c[i]);
  });
  let g = 0;
  for (const [, , size] of scores.values()) g += size;
  if (g < 2)
    throw new EstimationError('too-few-observations', 'need at least two clusters', 'respondent');
  const meat = [new CompensatedSum(), new CompensatedSum(), new CompensatedSum()];
  for (const [s0, s1, size] of scores.values()) {
    const [t0, t1] = [s0.value(), s1.value()];
    meat[0].addProduct(t0, t0 / size);
    meat[1].addProduct(t0, t1 / size);
    meat[2].addProduct(t1, t1 / size);
  }
  const [h00, h01, h11] = h.map((sum) => sum.value());
  const det = h00 * h11 - h01 * h01;
  const bread = [
    [h11 / det, -h01 / det],
    [-h01 / det, h00 / det],
  ];
  const [m00, m01, m11] = meat.map((sum) => sum.value());
  const mm = [
    [m00, m01],
    [m01, m11],
  ];
  const centred = multiply(multiply(bread, mm), bread);
  const back = [
    [1, -m],
    [0, 1],
  ];
  const factor = g / (g - 1);
  const covariance = multiply(multiply(back, centred), [
    [1, 0],
    [-m, 1],
  ]).map((row) => row.map((v) => v * factor));
  return { covariance, clusters: g };
}

function multiply(x: number[][], y: number[][]): number[][] {
  return [0, 1].map((i) => [0, 1].map((j) => x[i][0] * y[0][j] + x[i][1] * y[1][j]));
}
