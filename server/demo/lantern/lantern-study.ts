/** The invented demo study whose interviews are drawn from known demand curves. */
export const lanternStudy = {
  name: 'Solar lantern pricing, Lakeshore district',
  productName: 'Single-LED solar lantern with USB charging',
  currency: 'KES',
  locale: 'en-KE',
  market:
    'Households and shops of the invented Lakeshore district: North shore, South shore and Hill villages',
  targetSample: 300,
  priceMinMinor: 50000,
  priceMaxMinor: 400000,
  status: 'in_field' as const,
};

/** Interviews fall in this window (UTC dates). */
export const lanternFieldwork = { start: '2026-11-02', days: 26 };
