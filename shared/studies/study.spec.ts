import { studyCreateSchema, studyUpdateSchema } from './study';

const study = {
  name: 'Filter pricing, lake region',
  productName: 'Ceramic water filter',
  currency: 'KES',
  locale: 'en-KE',
  market: 'Households in three invented lakeside towns',
  targetSample: 400,
  priceMinMinor: 50000,
  priceMaxMinor: 400000,
};
const issues = (input: unknown) =>
  studyCreateSchema.safeParse(input).error?.issues.map((i) => [i.path.join('.'), i.message]) ?? [];

describe('the study schemas', () => {
  it('accepts a complete study and canonicalises its locale', () => {
    const parsed = studyCreateSchema.parse({ ...study, locale: 'EN-ke' });
    expect(parsed.locale).toBe('en-KE');
  });

  it('refuses an unknown or lower-case currency', () => {
    expect(issues({ ...study, currency: 'XYZ' })).toEqual([
      ['currency', 'Use a currency code such as USD, EUR or KES (ISO 4217, in capitals)'],
    ]);
    expect(issues({ ...study, currency: 'kes' })).toHaveLength(1);
  });

  it('refuses a locale that is not a language tag', () => {
    expect(issues({ ...study, locale: 'en_KE!' })).toEqual([
      ['locale', 'Use a language tag such as en-GB, fr-SN or sw-KE'],
    ]);
  });

  it('wants a target sample above zero and a price range the right way round', () => {
    expect(issues({ ...study, targetSample: 0 })).toEqual([
      ['targetSample', 'The target sample must be at least 1'],
    ]);
    expect(issues({ ...study, priceMaxMinor: 50000 })).toEqual([
      ['priceMaxMinor', 'The highest price must be above the lowest'],
    ]);
    expect(issues({ ...study, priceMinMinor: 12.5 })[0][0]).toBe('priceMinMinor');
  });

  it('names every missing field', () => {
    expect(issues({}).map(([path]) => path)).toEqual([
      'name',
      'productName',
      'currency',
      'locale',
      'market',
      'targetSample',
      'priceMinMinor',
      'priceMaxMinor',
    ]);
  });

  it('takes a partial update, with null removing the second product', () => {
    expect(studyUpdateSchema.safeParse({ secondProductName: null }).success).toBe(true);
    expect(studyUpdateSchema.safeParse({}).error?.issues[0].message).toBe(
      'Change at least one field',
    );
    expect(studyUpdateSchema.safeParse({ status: 'closed' }).success).toBe(false);
  });
});
