import { formatMoney } from '@shared/money/format-money';
import type { Block } from '@shared/questionnaire/block';
import { thresholdQuestions } from '@shared/questionnaire/blocks/price-thresholds-block';
import { thresholdNames } from './threshold-names';

type Money = (minor: number) => string;
type Answer = Record<string, unknown>;

/**
 * One block's answer in words a supervisor reads at a glance, with amounts in the study's
 * currency. Unknown shapes are shown as data rather than hidden.
 */
export function describeAnswer(
  block: Block,
  answer: unknown,
  currency: string,
  locale: string,
): string {
  if (answer === undefined || answer === null) return 'Not asked, or left unanswered';
  const money: Money = (minor) => formatMoney(minor, currency, locale);
  try {
    return describe(block, answer as Answer, money);
  } catch {
    return JSON.stringify(answer);
  }
}

function describe(block: Block, a: Answer, money: Money): string {
  switch (block.kind) {
    case 'consent':
      return a['agreed'] ? 'Agreed to take part' : 'Declined';
    case 'price-ladder':
      return (a['steps'] as { priceMinor: number; response: string | number }[])
        .map((step) => `${money(step.priceMinor)}: ${step.response}`)
        .join(' · ');
    case 'price-thresholds':
      return thresholdQuestions
        .map(([field]) => `${thresholdNames[field]} ${money(a[field] as number)}`)
        .concat(likelihoods(a))
        .join(' · ');
    case 'wtp-open':
      return money(a['amountMinor'] as number);
    case 'payment-card':
      return a['highestYesMinor'] === null
        ? 'None of the amounts'
        : `Up to ${money(a['highestYesMinor'] as number)}`;
    case 'dichotomous-choice':
      return [`At ${money(a['bidMinor'] as number)}: ${text(a['firstResponse'])}`]
        .concat(
          a['followUpMinor'] === undefined
            ? []
            : [`at ${money(a['followUpMinor'] as number)}: ${text(a['secondResponse'] ?? '—')}`],
        )
        .join('; ');
    default:
      return describeRecorded(block, a, money);
  }
}

function describeRecorded(block: Block, a: Answer, money: Money): string {
  switch (block.kind) {
    case 'shelf-observation':
      return `Shelf price ${money(a['priceMinor'] as number)} · pack ${text(a['packSize'])} ${block.packUnit} · ${text(a['quantity'])} ${block.measure === 'units-sold' ? 'sold' : 'in stock'}${a['photoId'] ? ' · tag photo' : ''}`;
    case 'purchase-recall':
      return `${text(a['units'])} bought${a['pricePaidMinor'] === undefined ? '' : `, ${money(a['pricePaidMinor'] as number)} each`}`;
    case 'household-size':
      return `${text(a['people'])} people`;
    case 'income-band':
      return a['band'] === null
        ? 'Preferred not to say'
        : (block.bands.find((b) => b.value === a['band'])?.label ?? text(a['band']));
    case 'location':
      return `${(a['latitude'] as number).toFixed(5)}, ${(a['longitude'] as number).toFixed(5)} (±${text(a['accuracyMetres'])} m)`;
    case 'photo': {
      const count = (a['photoIds'] as string[]).length;
      return `${count} photo${count === 1 ? '' : 's'}`;
    }
    case 'single-choice':
      return block.options.find((o) => o.value === a['value'])?.label ?? text(a['value']);
    case 'multiple-choice':
      return (a['values'] as string[])
        .map((value) => block.options.find((o) => o.value === value)?.label ?? value)
        .join(', ');
    case 'number':
      return `${text(a['value'])}${block.unit ? ` ${block.unit}` : ''}`;
    case 'text':
      return text(a['value']);
    default:
      return JSON.stringify(a);
  }
}

function likelihoods(a: Answer): string[] {
  if (a['likelihoodCheap'] === undefined) return [];
  return [
    `likelihood at the bargain price ${text(a['likelihoodCheap'])}/5`,
    `at the expensive price ${text(a['likelihoodExpensive'])}/5`,
  ];
}

/** A stored value as text: strings and numbers as they are, anything else as data. */
function text(value: unknown): string {
  return typeof value === 'string' || typeof value === 'number' || typeof value === 'boolean'
    ? String(value)
    : JSON.stringify(value);
}
