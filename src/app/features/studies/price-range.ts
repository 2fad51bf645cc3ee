import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { formatMoney } from '@shared/money/format-money';
import type { Study } from '@shared/studies/study';

/** A study's price range in its own currency and locale: "KSh 500.00 – KSh 4,000.00". */
@Component({
  selector: 'app-price-range',
  template: `{{ text() }}`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PriceRange {
  readonly study =
    input.required<Pick<Study, 'priceMinMinor' | 'priceMaxMinor' | 'currency' | 'locale'>>();

  protected readonly text = computed(() => {
    const { priceMinMinor, priceMaxMinor, currency, locale } = this.study();
    return `${formatMoney(priceMinMinor, currency, locale)} – ${formatMoney(priceMaxMinor, currency, locale)}`;
  });
}
