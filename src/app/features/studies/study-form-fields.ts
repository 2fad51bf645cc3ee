import { minorToDecimalString } from '@shared/money/format-money';
import { minorUnitDigits } from '@shared/money/minor-unit-digits';
import { parseMoney } from '@shared/money/parse-money';
import type { FieldIssue } from '@shared/http/api-error';
import type { Study, StudyCreate } from '@shared/studies/study';

/** The study form as typed: prices are the decimals a person writes, not minor units. */
export interface StudyFormValue {
  name: string;
  productName: string;
  secondProductName: string;
  currency: string;
  locale: string;
  market: string;
  targetSample: string;
  priceMin: string;
  priceMax: string;
}

export const emptyStudyForm: StudyFormValue = {
  name: '',
  productName: '',
  secondProductName: '',
  currency: 'USD',
  locale: 'en-US',
  market: '',
  targetSample: '',
  priceMin: '',
  priceMax: '',
};

/** A stored study written back into the form, prices as plain decimals of its currency. */
export function studyToForm(study: Study): StudyFormValue {
  const digits = minorUnitDigits(study.currency);
  return {
    name: study.name,
    productName: study.productName,
    secondProductName: study.secondProductName ?? '',
    currency: study.currency,
    locale: study.locale,
    market: study.market,
    targetSample: String(study.targetSample),
    priceMin: minorToDecimalString(study.priceMinMinor, digits),
    priceMax: minorToDecimalString(study.priceMaxMinor, digits),
  };
}

/**
 * Reads the form into the API's shape: prices parsed in the chosen currency and locale. A
 * price that cannot be read comes back as an issue on its field; the rest is left to the
 * shared schema, so the form and the server say the same thing.
 */
export function formToStudy(form: StudyFormValue): {
  study: Partial<StudyCreate>;
  issues: FieldIssue[];
} {
  const issues: FieldIssue[] = [];
  const price = (text: string, path: string): number | undefined => {
    if (!isKnownCurrency(form.currency)) return undefined;
    const parsed = parseMoney(text, form.currency, safeLocale(form.locale));
    if (parsed.ok) return parsed.minor;
    issues.push({ path, message: parsed.message });
    return undefined;
  };
  const study: Partial<StudyCreate> = {
    name: form.name,
    productName: form.productName,
    secondProductName: form.secondProductName.trim() === '' ? null : form.secondProductName,
    currency: form.currency,
    locale: form.locale,
    market: form.market,
    targetSample: form.targetSample.trim() === '' ? undefined : Number(form.targetSample),
    priceMinMinor: price(form.priceMin, 'priceMinMinor'),
    priceMaxMinor: price(form.priceMax, 'priceMaxMinor'),
  };
  return { study, issues };
}

function isKnownCurrency(code: string): boolean {
  return Intl.supportedValuesOf('currency').includes(code);
}

function safeLocale(tag: string): string {
  try {
    return Intl.getCanonicalLocales(tag)[0] ?? 'en';
  } catch {
    return 'en';
  }
}
