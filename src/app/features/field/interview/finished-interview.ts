import type { FieldInterview, GpsFix } from '@shared/field-sync/field-interview';
import type { PhotoManifestEntry } from '@shared/field-sync/photo-manifest';
import { photoReferences } from '@shared/field-sync/photo-references';
import type { Block } from '@shared/questionnaire/block';
import type { DraftInterview } from '../data/field-records';
import { withoutHiddenAnswers } from './interview-flow';

/**
 * The interview as the device sends it: answers of blocks no longer asked left out, and a
 * manifest entry for every photo the remaining answers refer to. Photos taken but not kept
 * (retaken, or on a block later skipped) are listed in `unusedPhotoIds` for deletion.
 *
 * @throws Error naming the photo when an answer refers to a photo the device does not hold.
 */
export function finishedInterview(
  draft: DraftInterview,
  blocks: readonly Block[],
  manifest: ReadonlyMap<string, PhotoManifestEntry>,
  finishedAt: string,
): { interview: FieldInterview; unusedPhotoIds: string[] } {
  const answers = withoutHiddenAnswers(blocks, draft.answers);
  const used = [...new Set(photoReferences(blocks, answers).map((ref) => ref.photoId))];
  const photos = used.map((id) => {
    const entry = manifest.get(id);
    if (!entry) throw new Error(`Photo ${id} is missing from this device; take it again`);
    return entry;
  });
  const interview: FieldInterview = {
    id: draft.id,
    studyId: draft.studyId,
    questionnaireVersionId: draft.questionnaireVersionId,
    routeId: draft.routeId,
    pointId: draft.pointId,
    startedAt: draft.startedAt,
    finishedAt,
    answers,
    photos,
    ...gpsOf(blocks, answers, draft.gps),
    ...(draft.respondentKey ? { respondentKey: draft.respondentKey } : {}),
    ...(draft.returnedAt ? { returnedAt: draft.returnedAt } : {}),
  };
  const unusedPhotoIds = [...manifest.keys()].filter((id) => !used.includes(id));
  return { interview, unusedPhotoIds };
}

/**
 * Where the interview took place: the fix recorded at a location block (taken on purpose, at
 * the site) or else the one the device took in the background when the interview started.
 */
function gpsOf(
  blocks: readonly Block[],
  answers: Readonly<Record<string, unknown>>,
  background: GpsFix | null,
): { gps?: GpsFix } {
  const located = blocks.find((block) => block.kind === 'location' && answers[block.id]);
  if (located) {
    const fix = answers[located.id] as {
      latitude: number;
      longitude: number;
      accuracyMetres: number;
    };
    return {
      gps: { latitude: fix.latitude, longitude: fix.longitude, accuracyM: fix.accuracyMetres },
    };
  }
  return background ? { gps: background } : {};
}
