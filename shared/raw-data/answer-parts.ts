import type { Block } from '../questionnaire/block';
import type { RawColumnType } from './raw-data-column';

/** A cell's value before it is written: text, a number, yes/no or empty. */
export type RawCell = string | number | boolean | null;

/**
 * One column an answer is spread over: `block.field`. Money is given in major units of the
 * study's currency; a photo part gives the photo's id, which the download turns into a link.
 */
export interface AnswerPart {
  readonly field: string;
  readonly type: RawColumnType;
  readonly unit: string | null;
  readonly allowed: readonly string[] | null;
  readonly description: string;
  readonly photo: boolean;
  read(answer: Readonly<Record<string, unknown>>): RawCell;
}

type Answer = Readonly<Record<string, unknown>>;

const yesNo = ['yes', 'no'] as const;

function part(
  field: string,
  type: RawColumnType,
  description: string,
  read: (answer: Answer) => unknown,
  extra: { unit?: string | null; allowed?: readonly string[] | null; photo?: boolean } = {},
): AnswerPart {
  return {
    field,
    type,
    description,
    unit: extra.unit ?? null,
    allowed: extra.allowed ?? null,
    photo: extra.photo ?? false,
    read: (answer) => asCell(read(answer)),
  };
}

function asCell(value: unknown): RawCell {
  if (value === undefined || value === null) return null;
  if (typeof value === 'string' || typeof value === 'boolean') return value;
  if (typeof value === 'number') return Number.isFinite(value) ? value : null;
  return JSON.stringify(value);
}

/**
 * The columns one block's answer is spread over, in the order the block asks them. Ladders get a
 * column per price, multiple choice a yes/no column per option, photo blocks a column per photo.
 */
export function answerParts(block: Block, currency: string, digits: number): AnswerPart[] {
  const major = (minor: number) => minor / 10 ** digits;
  const money = (minor: unknown) => (typeof minor === 'number' ? major(minor) : null);
  const moneyPart = (field: string, key: string, description: string) =>
    part(field, 'number', description, (a) => money(a[key]), { unit: currency });
  switch (block.kind) {
    case 'consent':
      return [part('agreed', 'boolean', 'Whether the respondent agreed', (a) => a['agreed'])];
    case 'price-ladder':
      return block.pricesMinor.map((priceMinor) => {
        const price = major(priceMinor);
        return part(
          `at_${price}`,
          block.scale === 'yes-no' ? 'text' : 'integer',
          block.scale === 'yes-no'
            ? `Would buy at ${price} ${currency}`
            : `Purchase intent at ${price} ${currency} (1 = surely not … 5 = surely)`,
          (a) => ladderStep(a, priceMinor),
          { allowed: block.scale === 'yes-no' ? yesNo : ['1', '2', '3', '4', '5'] },
        );
      });
    case 'price-thresholds':
      return [
        moneyPart('too_cheap', 'tooCheapMinor', 'Price so low the quality is doubted'),
        moneyPart('cheap', 'cheapMinor', 'Price that is a bargain'),
        moneyPart('expensive', 'expensiveMinor', 'Price that starts to seem expensive'),
        moneyPart('too_expensive', 'tooExpensiveMinor', 'Price too high to consider'),
        ...(block.askLikelihood
          ? [
              part(
                'likelihood_cheap',
                'integer',
                'Purchase likelihood at the bargain price',
                (a) => a['likelihoodCheap'],
                { allowed: ['1', '2', '3', '4', '5'] },
              ),
              part(
                'likelihood_expensive',
                'integer',
                'Purchase likelihood at the expensive price',
                (a) => a['likelihoodExpensive'],
                { allowed: ['1', '2', '3', '4', '5'] },
              ),
            ]
          : []),
      ];
    case 'wtp-open':
      return [moneyPart('amount', 'amountMinor', 'Most the respondent would pay')];
    case 'payment-card':
      return [
        part(
          'highest_yes',
          'number',
          'Highest card amount the respondent would pay; empty when none',
          (a) => money(a['highestYesMinor']),
          { unit: currency, allowed: block.amountsMinor.map((m) => String(major(m))) },
        ),
      ];
    case 'dichotomous-choice':
      return [
        moneyPart('bid', 'bidMinor', 'Bid put to the respondent'),
        part('response', 'text', 'Answer to the bid', (a) => a['firstResponse'], {
          allowed: yesNo,
        }),
        ...(block.bounds === 'double'
          ? [
              moneyPart(
                'follow_up_bid',
                'followUpMinor',
                'Second bid, higher after yes, lower after no',
              ),
              part(
                'follow_up_response',
                'text',
                'Answer to the second bid',
                (a) => a['secondResponse'],
                { allowed: yesNo },
              ),
            ]
          : []),
      ];
    case 'shelf-observation':
      return [
        moneyPart('price', 'priceMinor', 'Shelf price of one pack'),
        part('pack_size', 'number', 'Pack size', (a) => a['packSize'], { unit: block.packUnit }),
        part(
          'quantity',
          'number',
          block.measure === 'units-sold'
            ? `Units sold in the last ${block.periodDays ?? '?'} days`
            : 'Units in stock',
          (a) => a['quantity'],
          { unit: 'packs' },
        ),
        ...(block.photo === 'none'
          ? []
          : [
              part(
                'tag_photo',
                'url',
                'Link to the price-tag photo (expires)',
                (a) => a['photoId'],
                { photo: true },
              ),
            ]),
      ];
    case 'purchase-recall':
      return [
        part(
          'units',
          'integer',
          `Units bought in the last ${block.periodDays} days`,
          (a) => a['units'],
          { unit: 'units' },
        ),
        ...(block.askPricePaid
          ? [moneyPart('price_paid', 'pricePaidMinor', 'Price paid per unit the last time')]
          : []),
      ];
    case 'household-size':
      return [
        part('people', 'integer', 'People in the household', (a) => a['people'], {
          unit: 'people',
        }),
      ];
    case 'income-band':
      return [
        part(
          'band',
          'text',
          `Income band (per ${block.period}); empty when declined`,
          (a) => a['band'],
          {
            allowed: block.bands.map((b) => b.value),
          },
        ),
      ];
    case 'location':
      return [
        part('latitude', 'number', 'Latitude of the fix (WGS 84)', (a) => a['latitude'], {
          unit: 'degrees',
        }),
        part('longitude', 'number', 'Longitude of the fix (WGS 84)', (a) => a['longitude'], {
          unit: 'degrees',
        }),
        part('accuracy', 'number', 'Accuracy the device reported', (a) => a['accuracyMetres'], {
          unit: 'metres',
        }),
        part('captured_at', 'timestamp', 'When the fix was taken', (a) => a['capturedAt']),
      ];
    case 'photo':
      return Array.from({ length: block.maxPhotos }, (_, i) =>
        part(`photo_${i + 1}`, 'url', `Link to photo ${i + 1} (expires)`, (a) => photoAt(a, i), {
          photo: true,
        }),
      );
    case 'single-choice':
      return [
        part('value', 'text', 'Chosen option', (a) => a['value'], {
          allowed: block.options.map((o) => o.value),
        }),
      ];
    case 'multiple-choice':
      return block.options.map((option) =>
        part(option.value, 'boolean', `Chose “${option.label}”`, (a) => chose(a, option.value)),
      );
    case 'number':
      return [
        part('value', block.wholeNumber ? 'integer' : 'number', 'Number given', (a) => a['value']),
      ];
    case 'text':
      return [part('value', 'text', 'Text given', (a) => a['value'])];
  }
}

function ladderStep(answer: Answer, priceMinor: number): unknown {
  const steps = answer['steps'];
  if (!Array.isArray(steps)) return null;
  const step = (steps as { priceMinor?: unknown; response?: unknown }[]).find(
    (s) => s.priceMinor === priceMinor,
  );
  return step?.response ?? null;
}

function photoAt(answer: Answer, index: number): unknown {
  const ids = answer['photoIds'];
  return Array.isArray(ids) ? (ids[index] ?? null) : null;
}

function chose(answer: Answer, value: string): boolean | null {
  const values = answer['values'];
  return Array.isArray(values) ? values.includes(value) : null;
}
