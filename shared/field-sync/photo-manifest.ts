import { z } from 'zod';

/** The largest photo the server takes, after the device has downscaled it (2 MiB). */
export const maxPhotoBytes = 2 * 1024 * 1024;

/** Image formats a photo may have; the server checks the bytes, not just this label. */
export const photoContentTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;
export type PhotoContentType = (typeof photoContentTypes)[number];

/** The most photos one interview may declare. */
export const maxPhotosPerInterview = 40;

/**
 * One photo an interview declares before its bytes are sent: its id (made on the device), the
 * SHA-256 of the exact bytes that will be uploaded (lower-case hex), their count and format.
 * The server stores the photo only when the uploaded bytes match all of these.
 */
export const photoManifestEntrySchema = z.strictObject({
  photoId: z.uuid({ error: 'A photo is named by a UUID made on the device' }),
  sha256: z
    .string({ error: 'Give the SHA-256 of the photo' })
    .regex(/^[0-9a-f]{64}$/, { error: 'The SHA-256 is 64 lower-case hex digits' }),
  byteSize: z
    .int({ error: 'The size is a whole number of bytes' })
    .min(1, { error: 'A photo has at least one byte' })
    .max(maxPhotoBytes, {
      error: `A photo may be at most ${maxPhotoBytes} bytes (2 MiB); downscale it first`,
    }),
  contentType: z.enum(photoContentTypes, { error: 'A photo is a JPEG, PNG or WebP image' }),
});
export type PhotoManifestEntry = z.infer<typeof photoManifestEntrySchema>;

/**
 * Response header of `HEAD`/`GET /api/field/photos/:photoId` (and of each accepted chunk): how
 * many bytes of the photo the server holds, i.e. the offset of the next chunk to send.
 */
export const receivedBytesHeader = 'x-received-bytes';

/** Where an upload stands, as the photo endpoints answer it. */
export const photoUploadStateSchema = z.object({
  photoId: z.uuid(),
  interviewId: z.uuid(),
  byteSize: z.number().int(),
  receivedBytes: z.number().int(),
  stored: z.boolean(),
  storedAt: z.string().nullable(),
});
export type PhotoUploadState = z.infer<typeof photoUploadStateSchema>;
