import { z } from 'zod';

/**
 * A block's id: short, stable, readable in exports and skip conditions (`owns_filter`).
 * Lower-case letters, digits, `_` and `-`, starting with a letter.
 */
export const blockIdSchema = z
  .string({ error: 'Give the block an id' })
  .regex(/^[a-z][a-z0-9_-]{0,39}$/, {
    error: 'Use 1–40 lower-case letters, digits, - or _, starting with a letter',
  });
