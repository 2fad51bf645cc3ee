import { randomBytes, randomUUID } from 'node:crypto';
import type { FieldInterview } from '@shared/field-sync/field-interview';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { BenchDevice, BenchStudy } from './sync-bench-setup';

/** A realistic interview's questionnaire: nine blocks, consent first (an invented survey). */
export function benchDefinition(): { blocks: Block[] } {
  return {
    blocks: [
      starterBlock('consent', 'consent'),
      starterBlock('household-size', 'size'),
      starterBlock('income-band', 'income'),
      starterBlock('purchase-recall', 'recall'),
      starterBlock('price-ladder', 'ladder'),
      starterBlock('price-thresholds', 'psm'),
      starterBlock('wtp-open', 'wtp'),
      starterBlock('single-choice', 'owns'),
      { ...starterBlock('location', 'where'), required: false } as Block,
    ],
  };
}

/** A deterministic pseudo-random stream (mulberry32), so every run sends the same answers. */
function stream(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** One plausible interview of the bench questionnaire at one of the device's stops. */
export function benchInterview(
  study: BenchStudy,
  device: BenchDevice,
  n: number,
  random: () => number,
): FieldInterview {
  const point = device.points[n % device.points.length];
  const finished = Date.now() - Math.floor(random() * 86_400_000);
  const cut = 100 + 50 * Math.floor(random() * 4); // the first price answered "no"
  const steps = [100, 150, 200, 250, 300]
    .filter((price) => price <= cut)
    .map((priceMinor) => ({ priceMinor, response: priceMinor < cut ? 'yes' : 'no' }));
  const cheap = 100 + Math.floor(random() * 100);
  return {
    id: randomUUID(),
    studyId: study.studyId,
    questionnaireVersionId: study.versionId,
    routeId: device.routeId,
    pointId: point.id,
    startedAt: new Date(finished - (6 + Math.floor(random() * 10)) * 60_000).toISOString(),
    finishedAt: new Date(finished).toISOString(),
    answers: {
      consent: { agreed: true },
      size: { people: 1 + Math.floor(random() * 9) },
      income: { band: ['low', 'middle', 'high'][Math.floor(random() * 3)] },
      recall: { units: 1 + Math.floor(random() * 5), pricePaidMinor: 150 },
      ladder: { steps },
      psm: {
        tooCheapMinor: cheap - 50,
        cheapMinor: cheap,
        expensiveMinor: cheap + 150,
        tooExpensiveMinor: cheap + 300,
      },
      wtp: { amountMinor: 100 + Math.floor(random() * 400) },
      owns: { value: random() < 0.5 ? 'yes' : 'no' },
    },
    gps: {
      latitude: point.latitude + (random() - 0.5) * 0.0005,
      longitude: point.longitude,
      accuracyM: 5 + Math.floor(random() * 20),
    },
    respondentKey: randomBytes(16).toString('hex'),
    photos: [],
  };
}

/** `batches` batches of `size` interviews for one device. */
export function benchBatches(
  study: BenchStudy,
  device: BenchDevice,
  batches: number,
  size: number,
  seed: number,
): FieldInterview[][] {
  const random = stream(seed);
  return Array.from({ length: batches }, (_, b) =>
    Array.from({ length: size }, (_, i) => benchInterview(study, device, b * size + i, random)),
  );
}
