import { EstimationError } from '@shared/estimation/estimation-error';
import type { DemandCurve } from '@shared/estimation/welfare/demand-curve';
import {
  policyIncidence,
  type PolicyIncidence,
  type PricePolicy,
} from '@shared/estimation/welfare/policy-incidence';
import {
  constantElasticitySupply,
  type SupplyCurve,
} from '@shared/estimation/welfare/supply-curve';
import { asSentence } from '../figures/curve-figures';
import {
  estimateFieldsOnEnsemble,
  type CurveEnsemble,
  type EstimatedFigure,
} from '@shared/analysis/estimated-figure';

export type PolicyKind = PricePolicy['kind'];

/** What the researcher sets in the simulator. */
export interface PolicyInputs {
  readonly kind: PolicyKind;
  /** Per-unit tax or subsidy, in the study's currency. */
  readonly amount: number;
  /**
   * Percentage of the seller's price the buyer still pays under a co-payment, in (0, 100): shares
   * are typed in percent everywhere in the app; the engine's fraction is made here.
   */
  readonly buyerPercent: number;
  /** Price elasticity of supply, > 0. */
  readonly supplyElasticity: number;
  /** Today's market price: the supply curve passes through the demand curve here. */
  readonly marketPrice: number;
}

const figureKeys = [
  'quantityBefore',
  'buyerPrice',
  'sellerPrice',
  'quantity',
  'governmentRevenue',
  'buyerShare',
  'sellerShare',
  'deadweightLoss',
] as const;
export type PolicyFigureKey = (typeof figureKeys)[number];

/** The simulator's answer: every figure an estimate with its interval, plus the central case. */
export type PolicySimulation =
  | {
      readonly ok: true;
      readonly figures: Readonly<Record<PolicyFigureKey, EstimatedFigure>>;
      readonly central: PolicyIncidence;
      readonly supply: SupplyCurve;
    }
  | { readonly ok: false; readonly field: string; readonly message: string };

/** The policy as the engine takes it, or a message naming the input at fault. */
export function pricePolicyOf(
  inputs: PolicyInputs,
): PricePolicy | { field: string; message: string } {
  if (inputs.kind === 'co-payment') {
    if (!(inputs.buyerPercent > 0 && inputs.buyerPercent < 100)) {
      return {
        field: 'buyerPercent',
        message: 'Enter the buyer’s share in percent, above 0 and below 100 (say 40).',
      };
    }
    return { kind: 'co-payment', buyerShare: inputs.buyerPercent / 100 };
  }
  if (!(Number.isFinite(inputs.amount) && inputs.amount > 0)) {
    const what = inputs.kind === 'unit-tax' ? 'tax' : 'subsidy';
    return { field: 'amount', message: `Enter a ${what} per unit above 0.` };
  }
  return { kind: inputs.kind, amount: inputs.amount };
}

/** Supply of the stated elasticity through the demand curve at the market price. */
export function supplyThroughMarket(demand: DemandCurve, inputs: PolicyInputs): SupplyCurve {
  const quantity = demand.quantity(inputs.marketPrice);
  return constantElasticitySupply(inputs.marketPrice, quantity, inputs.supplyElasticity);
}

function figuresOf(result: PolicyIncidence): Record<PolicyFigureKey, number> {
  return {
    quantityBefore: result.before.quantity,
    buyerPrice: result.buyerPrice,
    sellerPrice: result.sellerPrice,
    quantity: result.quantity,
    governmentRevenue: result.governmentRevenue,
    buyerShare: result.buyerShare,
    sellerShare: result.sellerShare,
    deadweightLoss: result.deadweightLoss,
  };
}

/**
 * Runs a tax, subsidy or co-payment against a supply curve of the stated elasticity drawn
 * through today's market point, on the fitted demand curve and on each simulated curve, so each
 * figure carries a percentile interval. Engine refusals come back as a message, not a throw.
 */
export function simulatePolicy(ensemble: CurveEnsemble, inputs: PolicyInputs): PolicySimulation {
  if (!(Number.isFinite(inputs.marketPrice) && inputs.marketPrice > 0)) {
    return { ok: false, field: 'marketPrice', message: 'Enter today’s market price above 0.' };
  }
  if (!(Number.isFinite(inputs.supplyElasticity) && inputs.supplyElasticity > 0)) {
    return {
      ok: false,
      field: 'supplyElasticity',
      message: 'Enter a supply elasticity above 0 (1 means supply grows in step with price).',
    };
  }
  const policy = pricePolicyOf(inputs);
  if (!('kind' in policy)) return { ok: false, ...policy };
  try {
    const supply = supplyThroughMarket(ensemble.central, inputs);
    const central = policyIncidence(ensemble.central, supply, policy);
    const figures = estimateFieldsOnEnsemble(ensemble, (curve) =>
      figuresOf(policyIncidence(curve, supplyThroughMarket(curve, inputs), policy)),
    );
    return { ok: true, figures, central, supply };
  } catch (error) {
    if (!(error instanceof EstimationError)) throw error;
    return { ok: false, field: error.field ?? 'policy', message: asSentence(error.message) };
  }
}

/** Keys in the order the simulator lists them. */
export const policyFigureOrder: readonly PolicyFigureKey[] = figureKeys;
