/**
 * The estimation methods a fit can use: demand from observed prices and quantities (shelf
 * observations or purchase recall), the price ladder (Gabor–Granger), price thresholds (Van
 * Westendorp with the Newton–Miller–Smith follow-ups), open willingness to pay, payment cards and
 * dichotomous choice (single- or double-bounded, as the block was asked).
 */
export const analysisMethods = [
  'observed-prices',
  'price-ladder',
  'price-thresholds',
  'wtp-open',
  'payment-card',
  'dichotomous-choice',
] as const;
export type AnalysisMethod = (typeof analysisMethods)[number];

/** Names shown on screens, in downloads and in e-mails. */
export const analysisMethodLabels: Readonly<Record<AnalysisMethod, string>> = {
  'observed-prices': 'Observed prices and quantities (least squares)',
  'price-ladder': 'Price ladder (Gabor–Granger)',
  'price-thresholds': 'Price thresholds (Van Westendorp, Newton–Miller–Smith)',
  'wtp-open': 'Open willingness to pay',
  'payment-card': 'Payment card (interval maximum likelihood)',
  'dichotomous-choice': 'Dichotomous choice (logit maximum likelihood)',
};

/** The questionnaire block kind each method reads its answers from. */
export const methodBlockKinds = {
  'observed-prices': ['shelf-observation', 'purchase-recall'],
  'price-ladder': ['price-ladder'],
  'price-thresholds': ['price-thresholds'],
  'wtp-open': ['wtp-open'],
  'payment-card': ['payment-card'],
  'dichotomous-choice': ['dichotomous-choice'],
} as const satisfies Readonly<Record<AnalysisMethod, readonly string[]>>;
