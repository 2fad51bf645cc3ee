import { EstimationError } from '../estimation-error';
import { adaptiveSimpson } from '../numerics/adaptive-simpson';
import type { DemandCurve } from './demand-curve';
import { demandSlope } from './demand-slope';
import { marketEquilibrium, solveSellerPrice, type Equilibrium } from './market-equilibrium';
import type { SupplyCurve } from './supply-curve';

/**
 * A price wedge between buyers and sellers: a per-unit tax, a per-unit subsidy, or a co-payment
 * (buyers pay `buyerShare` of the seller's price; a payer covers the rest).
 */
export type PricePolicy =
  | { readonly kind: 'unit-tax'; readonly amount: number }
  | { readonly kind: 'unit-subsidy'; readonly amount: number }
  | { readonly kind: 'co-payment'; readonly buyerShare: number };

export interface PolicyIncidence {
  readonly before: Equilibrium;
  readonly buyerPrice: number;
  readonly sellerPrice: number;
  readonly quantity: number;
  /** Share of the wedge borne by buyers, (buyer price − P₀)/(buyer price − seller price). */
  readonly buyerShare: number;
  readonly sellerShare: number;
  /** εs/(εs − εd) at the old equilibrium: the small-wedge approximation of the buyer share. */
  readonly buyerShareByElasticities: number;
  /** (buyer price − seller price)·quantity: tax revenue, negative for spending on a subsidy. */
  readonly governmentRevenue: number;
  readonly consumerSurplusChange: number;
  readonly producerSurplusChange: number;
  /** −(ΔCS + ΔPS + revenue) ≥ 0. */
  readonly deadweightLoss: number;
  readonly assumptions: string[];
}

/**
 * Incidence of a per-unit tax, subsidy or co-payment: the new buyer and seller prices and quantity,
 * who bears the wedge, the revenue (or spending), the surplus changes (areas under the curves by
 * adaptive Simpson; exact for linear curves) and the deadweight loss.
 */
export function policyIncidence(
  demand: DemandCurve,
  supply: SupplyCurve,
  policy: PricePolicy,
): PolicyIncidence {
  const wedge = toWedge(policy);
  const before = marketEquilibrium(demand, supply);
  const sellerPrice = solveSellerPrice(demand, supply, wedge);
  const buyerPrice = wedge.factor * sellerPrice + wedge.add;
  const quantity = demand.quantity(buyerPrice);
  const gap = buyerPrice - sellerPrice;
  const consumerSurplusChange = -adaptiveSimpson(
    (p) => demand.quantity(p),
    before.price,
    buyerPrice,
    'price',
  );
  const producerSurplusChange = -adaptiveSimpson(
    (p) => supply.quantity(p),
    sellerPrice,
    before.price,
    'price',
  );
  const governmentRevenue = gap * quantity;
  const ed = (demandSlope(demand, before.price) * before.price) / before.quantity;
  const es = (supply.slope(before.price) * before.price) / before.quantity;
  return {
    before,
    buyerPrice,
    sellerPrice,
    quantity,
    buyerShare: (buyerPrice - before.price) / gap,
    sellerShare: (before.price - sellerPrice) / gap,
    buyerShareByElasticities: es / (es - ed),
    governmentRevenue,
    consumerSurplusChange,
    producerSurplusChange,
    deadweightLoss: -(consumerSurplusChange + producerSurplusChange + governmentRevenue),
    assumptions: [
      'competitive market; incidence does not depend on which side remits the tax',
      'surplus changes are areas under the demand and supply curves between the old and new prices',
    ],
  };
}

function toWedge(policy: PricePolicy): { factor: number; add: number } {
  if (policy.kind === 'co-payment') {
    if (!(policy.buyerShare > 0 && policy.buyerShare < 1)) {
      throw new EstimationError(
        'invalid-value',
        'the buyer share of a co-payment must lie in (0, 1)',
        'buyerShare',
      );
    }
    return { factor: policy.buyerShare, add: 0 };
  }
  if (!(Number.isFinite(policy.amount) && policy.amount > 0)) {
    throw new EstimationError(
      'invalid-value',
      'the per-unit amount must be a number > 0',
      'amount',
    );
  }
  return { factor: 1, add: policy.kind === 'unit-tax' ? policy.amount : -policy.amount };
}
