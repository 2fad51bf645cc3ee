/** Every kind of block a Fieldcurve questionnaire can hold, in the order the editor offers them. */
export const blockKinds = [
  'consent',
  'price-ladder',
  'price-thresholds',
  'wtp-open',
  'payment-card',
  'dichotomous-choice',
  'shelf-observation',
  'purchase-recall',
  'household-size',
  'income-band',
  'location',
  'photo',
  'single-choice',
  'multiple-choice',
  'number',
  'text',
] as const;

export type BlockKind = (typeof blockKinds)[number];

/** Names people read in the editor, the preview and reports. */
export const blockKindLabels: Readonly<Record<BlockKind, string>> = {
  consent: 'Consent',
  'price-ladder': 'Price ladder',
  'price-thresholds': 'Price thresholds',
  'wtp-open': 'Most they would pay',
  'payment-card': 'Payment card',
  'dichotomous-choice': 'Yes or no at a bid',
  'shelf-observation': 'Shelf observation',
  'purchase-recall': 'Purchase recall',
  'household-size': 'Household size',
  'income-band': 'Income band',
  location: 'Location',
  photo: 'Photo',
  'single-choice': 'Single choice',
  'multiple-choice': 'Multiple choice',
  number: 'Number',
  text: 'Text',
};
