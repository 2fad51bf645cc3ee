import { z } from 'zod';

/** A field device (one signed-in browser) of a study's enumerator, as its last sync left it. */
export const fieldDeviceSchema = z.object({
  id: z.uuid(),
  userId: z.uuid(),
  enumeratorName: z.string(),
  /** The browser's description of itself, shortened. */
  label: z.string(),
  firstSeenAt: z.string(),
  lastSyncAt: z.string(),
  /** Interviews in the last batch, and how many of them were newly stored. */
  lastSyncSent: z.number().int(),
  lastSyncAccepted: z.number().int(),
  /** What the device said it still held unsent at that sync; null when it did not say. */
  queuedAtLastSync: z.number().int().nullable(),
  signedOutAt: z.string().nullable(),
});
export type FieldDevice = z.infer<typeof fieldDeviceSchema>;
