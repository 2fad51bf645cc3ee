import type { SamplingPointKind } from '@shared/sampling/sampling-point-kind';
import { lanternRegions, type LanternRegion } from './lantern-truths';

export interface LanternSite {
  readonly code: string;
  readonly name: string;
  readonly kind: SamplingPointKind;
  readonly region: LanternRegion;
  readonly latitude: number;
  readonly longitude: number;
  /** Interviews recorded there: shop visits or households. */
  readonly interviews: number;
}

const prefixes: Record<LanternRegion, string> = {
  'North shore': 'NS',
  'South shore': 'SS',
  'Hill villages': 'HV',
};
const shopNames = [
  'Corner store',
  'Jetty kiosk',
  'Market hardware',
  'Fisherfolk supplies',
  'Roadside shop',
  'Ferry stop store',
];

/** Six shops (four visits each) and ten household clusters (eight households each) per region. */
export const lanternSites: LanternSite[] = lanternRegions.flatMap((region, r) => {
  const prefix = prefixes[region];
  const place = (i: number) => ({
    latitude: -0.4 - r * 0.05 - i * 0.003,
    longitude: 33.9 + r * 0.04 + i * 0.002,
  });
  const shops = shopNames.map((name, i) => ({
    code: `${prefix}-S${String(i + 1).padStart(2, '0')}`,
    name: `${name}, ${region}`,
    kind: 'shop' as const,
    region,
    ...place(i),
    interviews: 4,
  }));
  const households = Array.from({ length: 10 }, (_, i) => ({
    code: `${prefix}-H${String(i + 1).padStart(2, '0')}`,
    name: `Household cluster ${i + 1}, ${region}`,
    kind: 'household' as const,
    region,
    ...place(i + 6),
    interviews: 8,
  }));
  return [...shops, ...households];
});
