/** What one interview gives a method: its rows (and the block read), or why it gives none. */
export type Extraction<R> =
  | {
      readonly rows: R[];
      readonly blockId: string;
      /** Prices the block fixed (ladder prices, bids, card amounts), in major units. */
      readonly design?: readonly number[];
      readonly bounds?: 'single' | 'double';
    }
  | { readonly skip: string };

export const noBlock = (what: string) => ({ skip: `no ${what} in its questionnaire` });
export const notAnswered = (what: string) => ({ skip: `${what} not answered` });
