import type { InterviewAnswers } from '../questionnaire/answer';
import type { Block } from '../questionnaire/block';

/**
 * The photo ids an interview's answers refer to, with the answer field that names each: photo
 * blocks (`photoIds`) and shelf observations (`photoId`). The interview's photo manifest must
 * list exactly these.
 */
export function photoReferences(
  blocks: readonly Block[],
  answers: InterviewAnswers,
): { photoId: string; path: string }[] {
  const found: { photoId: string; path: string }[] = [];
  for (const block of blocks) {
    const answer = answers[block.id] as Record<string, unknown> | undefined;
    if (!answer || typeof answer !== 'object') continue;
    if (block.kind === 'photo' && Array.isArray(answer['photoIds'])) {
      (answer['photoIds'] as unknown[]).forEach((photoId, i) => {
        if (typeof photoId === 'string') {
          found.push({ photoId, path: `answers.${block.id}.photoIds.${i}` });
        }
      });
    }
    if (block.kind === 'shelf-observation' && typeof answer['photoId'] === 'string') {
      found.push({ photoId: answer['photoId'], path: `answers.${block.id}.photoId` });
    }
  }
  return found;
}

/** Problems between the answers' photo references and the declared manifest, by field. */
export function photoManifestProblems(
  blocks: readonly Block[],
  answers: InterviewAnswers,
  manifest: readonly { photoId: string }[],
): { path: string; message: string }[] {
  const references = photoReferences(blocks, answers);
  if (references.length === 0 && manifest.length === 0) return [];
  const declared = new Set(manifest.map((photo) => photo.photoId));
  const referenced = new Set(references.map((ref) => ref.photoId));
  const problems = references
    .filter((ref) => !declared.has(ref.photoId))
    .map((ref) => ({ path: ref.path, message: 'This photo is not in the photo list' }));
  manifest.forEach((photo, i) => {
    if (!referenced.has(photo.photoId)) {
      problems.push({ path: `photos.${i}`, message: 'No answer refers to this photo' });
    }
  });
  return problems;
}
