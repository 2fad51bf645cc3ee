import { z } from 'zod';
import { isStorableInstant } from '../storable/storable-instant';
import { unstorableJsonProblems } from '../storable/unstorable-json';
import type { FieldInterview } from './field-interview';
import {
  maxPhotoBytes,
  maxPhotosPerInterview,
  photoContentTypes,
  type PhotoManifestEntry,
} from './photo-manifest';

// The very patterns the schema's formats use, so the two cannot drift apart.
const uuid = z.regexes.uuid();
const instant = z.regexes.datetime({ offset: true, local: false, precision: null });
const respondentKey = /^[A-Za-z0-9_-]{16,128}$/;
const sha256 = /^[0-9a-f]{64}$/;

const required = [
  'id',
  'studyId',
  'questionnaireVersionId',
  'routeId',
  'pointId',
  'startedAt',
  'finishedAt',
  'answers',
  'photos',
] as const;
const allowed = new Set<string>([...required, 'gps', 'respondentKey', 'returnedAt']);
const contentTypes = new Set<string>(photoContentTypes);

type Plain = Record<string, unknown>;

/** A plain object as JSON makes it: not null, not an array, no class. */
function isPlain(value: unknown): value is Plain {
  return (
    typeof value === 'object' && value !== null && Object.getPrototypeOf(value) === Object.prototype
  );
}

function hasExactly(record: Plain, keys: readonly string[]): boolean {
  const own = Object.keys(record);
  return own.length === keys.length && keys.every((key) => key in record);
}

const isText = (value: unknown, pattern: RegExp) =>
  typeof value === 'string' && pattern.test(value);

const isInstant = (value: unknown) => isText(value, instant) && isStorableInstant(value as string);

function gpsFits(gps: unknown): boolean {
  if (gps === undefined) return true;
  if (!isPlain(gps) || !hasExactly(gps, ['latitude', 'longitude', 'accuracyM'])) return false;
  const { latitude, longitude, accuracyM } = gps;
  return (
    typeof latitude === 'number' &&
    Number.isFinite(latitude) &&
    latitude >= -90 &&
    latitude <= 90 &&
    typeof longitude === 'number' &&
    Number.isFinite(longitude) &&
    longitude >= -180 &&
    longitude <= 180 &&
    typeof accuracyM === 'number' &&
    Number.isFinite(accuracyM) &&
    accuracyM >= 0
  );
}

function photosFit(photos: unknown): photos is PhotoManifestEntry[] {
  if (!Array.isArray(photos) || photos.length > maxPhotosPerInterview) return false;
  const ids = new Set<unknown>();
  for (const photo of photos as unknown[]) {
    if (!isPlain(photo) || !hasExactly(photo, ['photoId', 'sha256', 'byteSize', 'contentType']))
      return false;
    const { photoId, byteSize, contentType } = photo;
    if (!isText(photoId, uuid) || !isText(photo['sha256'], sha256) || ids.has(photoId))
      return false;
    if (!(Number.isSafeInteger(byteSize) && (byteSize as number) >= 1)) return false;
    if ((byteSize as number) > maxPhotoBytes || !contentTypes.has(contentType as string))
      return false;
    ids.add(photoId);
  }
  return true;
}

/**
 * A quick, plain-code test that `fieldInterviewSchema` accepts an item as it is. True only when
 * the schema certainly would (the sync path then skips it); anything unusual answers false and
 * the schema judges it, so refusals are word for word the schema's. Checked against the schema
 * on seeded mutations (field-interview-fits.spec.ts).
 */
export function fitsFieldInterview(raw: unknown): raw is FieldInterview {
  if (!isPlain(raw)) return false;
  for (const key of Object.keys(raw)) if (!allowed.has(key)) return false;
  for (const key of required) if (!(key in raw)) return false;
  const { startedAt, finishedAt } = raw;
  return (
    isText(raw['id'], uuid) &&
    isText(raw['studyId'], uuid) &&
    isText(raw['questionnaireVersionId'], uuid) &&
    isText(raw['routeId'], uuid) &&
    isText(raw['pointId'], uuid) &&
    isInstant(startedAt) &&
    isInstant(finishedAt) &&
    Date.parse(finishedAt as string) >= Date.parse(startedAt as string) &&
    isPlain(raw['answers']) &&
    unstorableJsonProblems(raw['answers']).length === 0 &&
    gpsFits(raw['gps']) &&
    (raw['respondentKey'] === undefined || isText(raw['respondentKey'], respondentKey)) &&
    (raw['returnedAt'] === undefined || isInstant(raw['returnedAt'])) &&
    photosFit(raw['photos'])
  );
}
