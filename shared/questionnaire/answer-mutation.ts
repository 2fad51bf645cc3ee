/**
 * Values on, or just past, the edges the answer schemas check: types, ranges, formats, the
 * blocks' own settings in `answer-samples.ts` (for specs).
 */
const oddValues: readonly unknown[] = [
  ...[0, -0, 1, -1, 0.5, 2, 5, 6, 10, 11, 12, 13, 30, 31, 50, 99, 100, 150, 200, 300, 400],
  ...[500, 501, 600, 800, 1000, 1001, 5000, 5001, 100000, 2 ** 53 - 1, 2 ** 53, 1e300, -1e300],
  ...[NaN, Infinity, -Infinity, -90, -90.5, 180.5, 10.25, 10.26, -5.5, -5.51, 1e-9],
  ...['', ' ', 'yes', 'no', 'maybe', 'YES', 'low', 'middle', 'high', 'first', 'third', 'fourth'],
  ...['100', 'x'.repeat(13), ' '.repeat(14), 'not-a-uuid'],
  '6f1c3f43-8a57-4c1e-9f0e-3b1d2a4c5e61',
  '6F1C3F43-8A57-4C1E-9F0E-3B1D2A4C5E61',
  '6f1c3f43-8a57-0c1e-9f0e-3b1d2a4c5e61',
  ...['2027-03-01T09:00:00Z', '2027-03-01T09:00:00', '2027-02-30T09:00:00Z'],
  ...['2027-03-01 09:00:00Z', '2027-03-01T09:00:00+3:00'],
  ...[true, false, null, undefined, [], {}, ['first'], ['first', 'first']],
  { agreed: true },
  { priceMinor: 100, response: 'yes' },
];

const pick = <T>(list: readonly T[], random: () => number): T =>
  list[Math.floor(random() * list.length)];

/** A number near `value`: one either side, a tenth off, ten times, the negative. */
function nearby(value: number, random: () => number): number {
  return pick([value + 1, value - 1, value + 0.1, value * 10, -value], random);
}

function mutateArray(list: readonly unknown[], random: () => number): unknown[] {
  const copy = [...list];
  const at = Math.floor(random() * copy.length);
  switch (copy.length === 0 ? 0 : Math.floor(random() * 6)) {
    case 0:
      copy.push(pick(oddValues, random));
      break;
    case 1:
      copy.push(structuredClone(copy[at]));
      break;
    case 2:
      copy.splice(at, 1);
      break;
    case 3:
      copy.length = 0;
      break;
    case 4:
      copy[at] = pick(oddValues, random);
      break;
    default:
      copy[at] = mutateAnswer(copy[at], random);
  }
  return copy;
}

function mutateRecord(record: object, random: () => number): Record<string, unknown> {
  const copy: Record<string, unknown> = { ...record };
  const keys = Object.keys(copy);
  const key = keys.length > 0 ? pick(keys, random) : 'extra';
  const value = copy[key];
  switch (Math.floor(random() * 5)) {
    case 0:
      copy[key] = pick(oddValues, random);
      break;
    case 1:
      delete copy[key];
      break;
    case 2:
      copy[pick(['extra', 'value', 'photoId', 'likelihoodCheap'], random)] = pick(
        oddValues,
        random,
      );
      break;
    case 3:
      copy[key] = typeof value === 'number' ? nearby(value, random) : mutateAnswer(value, random);
      break;
    default:
      copy[key] = mutateAnswer(value, random);
  }
  return copy;
}

/**
 * A changed copy of an answer: one value replaced, removed, added or nudged, at the top or
 * deeper down; now and then the whole answer swapped for an odd value (for specs). Most
 * results are invalid, some stay valid.
 */
export function mutateAnswer(value: unknown, random: () => number): unknown {
  if (random() < 0.04 || value === null || typeof value !== 'object') {
    return typeof value === 'number' && random() < 0.5
      ? nearby(value, random)
      : pick(oddValues, random);
  }
  return Array.isArray(value) ? mutateArray(value, random) : mutateRecord(value, random);
}
