/** One currency offered in the study form: its ISO 4217 code and its English name. */
export interface CurrencyChoice {
  readonly code: string;
  readonly name: string;
}

/** Every currency the browser's Intl knows, by code, named for people. */
export function currencyChoices(): CurrencyChoice[] {
  const names = new Intl.DisplayNames(['en'], { type: 'currency' });
  return Intl.supportedValuesOf('currency').map((code) => ({ code, name: names.of(code) ?? code }));
}
