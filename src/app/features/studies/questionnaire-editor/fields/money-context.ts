/** The study's currency and locale, which every amount in the editor is typed and shown in. */
export interface MoneyContext {
  readonly currency: string;
  readonly locale: string;
}
