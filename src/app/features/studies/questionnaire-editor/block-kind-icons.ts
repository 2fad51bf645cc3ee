import type { BlockKind } from '@shared/questionnaire/block-kind';

/** The Material Symbols icon that marks each kind of block in the editor. */
export const blockKindIcons: Readonly<Record<BlockKind, string>> = {
  consent: 'handshake',
  'price-ladder': 'stairs',
  'price-thresholds': 'tune',
  'wtp-open': 'payments',
  'payment-card': 'style',
  'dichotomous-choice': 'thumbs_up_down',
  'shelf-observation': 'storefront',
  'purchase-recall': 'shopping_basket',
  'household-size': 'family_restroom',
  'income-band': 'account_balance_wallet',
  location: 'location_on',
  photo: 'photo_camera',
  'single-choice': 'radio_button_checked',
  'multiple-choice': 'check_box',
  number: 'pin',
  text: 'notes',
};
