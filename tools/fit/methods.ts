import type { FitMethod } from './fit-method';
import { olsMethod } from './methods/ols';
import { priceLadderMethod } from './methods/price-ladder';
import { priceThresholdsMethod } from './methods/price-thresholds';
import { wtpCardMethod } from './methods/wtp-card';
import { wtpDoubleMethod } from './methods/wtp-double';
import { wtpOpenMethod } from './methods/wtp-open';
import { wtpSingleMethod } from './methods/wtp-single';

/** Every method `npm run fit -- --method NAME` knows. */
export const methods: readonly FitMethod[] = [
  olsMethod,
  priceLadderMethod,
  priceThresholdsMethod,
  wtpOpenMethod,
  wtpSingleMethod,
  wtpDoubleMethod,
  wtpCardMethod,
];
