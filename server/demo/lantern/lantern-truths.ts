/**
 * The known truths the demo's interviews are drawn from, so a newcomer can fit and see them
 * recovered. Prices in KES (major units); the scenario is invented.
 */
export const lanternTruths = {
  /** Shelf sales follow Q = A_region · (P / 1000)^elasticity · e^u, u ~ N(0, noiseSd²). */
  shelfElasticity: -1.4,
  /** Units sold per week at 1000 KES, by region. */
  shelfScaleByRegion: { 'North shore': 30, 'South shore': 22, 'Hill villages': 14 },
  shelfNoiseSd: 0.2,
  /** Shelf prices are drawn uniformly between these. */
  shelfPriceRange: { min: 800, max: 2600 },
  /** Willingness to pay is logistic: median + scale · ln(U / (1 − U)). */
  wtpMedian: 1500,
  wtpScale: 300,
  seed: 20261107,
} as const;

export type LanternRegion = keyof typeof lanternTruths.shelfScaleByRegion;
export const lanternRegions = Object.keys(lanternTruths.shelfScaleByRegion) as LanternRegion[];
