import type { EstimatedFigure } from '@shared/analysis/estimated-figure';
import type { FigureUnit } from '../figures/figure-format';
import type { PolicyFigureKey, PolicyKind } from './policy-simulation';

/** One line of the simulator's answer: what it is, how to write it, and the figure. */
export interface PolicyFigureLine {
  readonly key: PolicyFigureKey;
  readonly label: string;
  readonly unit: FigureUnit;
  readonly figure: EstimatedFigure;
}

/** The figure with its sign turned (spending shown as a positive cost); the interval flips. */
export function negated(figure: EstimatedFigure): EstimatedFigure {
  return {
    estimate: -figure.estimate,
    low: figure.high === null ? null : -figure.high,
    high: figure.low === null ? null : -figure.low,
    note: figure.note,
  };
}

const revenueLabels: Record<PolicyKind, string> = {
  'unit-tax': 'Tax revenue',
  'unit-subsidy': 'Subsidy cost',
  'co-payment': 'Cost to the payer',
};

/**
 * How each side's share of the wedge is named. A tax is a burden that buyers and sellers bear
 * between them; a subsidy or a co-payment is a benefit, and the same share says how much of it
 * reaches each side (a lower buyer price, a higher seller price).
 */
const incidenceLabels: Record<PolicyKind, { buyers: string; sellers: string }> = {
  'unit-tax': { buyers: 'Borne by buyers', sellers: 'Borne by sellers' },
  'unit-subsidy': {
    buyers: 'Buyers’ share of the subsidy’s benefit',
    sellers: 'Sellers’ share of the subsidy’s benefit',
  },
  'co-payment': {
    buyers: 'Buyers’ share of the co-payment’s benefit',
    sellers: 'Sellers’ share of the co-payment’s benefit',
  },
};

/**
 * The simulator's figures in reading order with their labels; spending under a subsidy or a
 * co-payment is shown as a positive cost rather than a negative revenue.
 */
export function policyFigureLines(
  figures: Readonly<Record<PolicyFigureKey, EstimatedFigure>>,
  kind: PolicyKind,
  quantityUnit: 'quantity' | 'share',
): PolicyFigureLine[] {
  const spending = kind !== 'unit-tax';
  // On a purchase-share curve money figures are per potential buyer, not for the market.
  const share = quantityUnit === 'share';
  const perBuyer = share ? ' per potential buyer' : '';
  return [
    {
      key: 'quantityBefore',
      label: share ? 'Buying share today' : 'Quantity today',
      unit: quantityUnit,
      figure: figures.quantityBefore,
    },
    { key: 'buyerPrice', label: 'New price buyers pay', unit: 'price', figure: figures.buyerPrice },
    {
      key: 'sellerPrice',
      label: 'New price sellers receive',
      unit: 'price',
      figure: figures.sellerPrice,
    },
    {
      key: 'quantity',
      label: share ? 'New buying share' : 'New quantity',
      unit: quantityUnit,
      figure: figures.quantity,
    },
    {
      key: 'governmentRevenue',
      label: `${revenueLabels[kind]}${perBuyer}`,
      unit: 'price',
      figure: spending ? negated(figures.governmentRevenue) : figures.governmentRevenue,
    },
    {
      key: 'buyerShare',
      label: incidenceLabels[kind].buyers,
      unit: 'share',
      figure: figures.buyerShare,
    },
    {
      key: 'sellerShare',
      label: incidenceLabels[kind].sellers,
      unit: 'share',
      figure: figures.sellerShare,
    },
    {
      key: 'deadweightLoss',
      label: `Deadweight loss${perBuyer}`,
      unit: 'price',
      figure: figures.deadweightLoss,
    },
  ];
}
