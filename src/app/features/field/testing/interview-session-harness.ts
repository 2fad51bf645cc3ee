import { TestBed } from '@angular/core/testing';
import type { FieldAssignments } from '@shared/field-sync/field-assignments';
import { Session } from '../../../core/session';
import { TypingProblems } from '../../field-blocks/typing-problems';
import { AssignmentsCache } from '../assignments/assignments-cache';
import { GpsReader } from '../capture/gps-reader';
import { FieldStore } from '../data/field-store';
import { InterviewDrafts } from '../interview/interview-drafts';
import { InterviewSession } from '../interview/interview-session';
import { pointId, routeId, studyId, versionId } from './field-fixtures';

/**
 * An interview session loaded on a fresh draft at the fixture point, with the device's
 * assignments read from `assignments`, no GPS fix and a signed-in enumerator. Delete
 * `store.db` after each test.
 */
export async function startInterviewSession(assignments: FieldAssignments) {
  const userId = crypto.randomUUID();
  TestBed.configureTestingModule({
    providers: [
      InterviewSession,
      TypingProblems,
      { provide: Session, useValue: { info: () => ({ user: { id: userId } }) } },
      { provide: GpsReader, useValue: { readOnce: () => Promise.resolve({ ok: false }) } },
      {
        provide: AssignmentsCache,
        useValue: { read: () => Promise.resolve({ key: 'current', payload: assignments }) },
      },
    ],
  });
  const store = TestBed.inject(FieldStore);
  const place = { studyId, routeId, pointId, questionnaireVersionId: versionId };
  const draftId = (await TestBed.inject(InterviewDrafts).start(place)).id;
  const session = TestBed.inject(InterviewSession);
  await session.load(draftId);
  return { session, store, draftId, typing: TestBed.inject(TypingProblems) };
}
