import { fieldInterviewSchema } from '@shared/field-sync/field-interview';
import type { Block } from '@shared/questionnaire/block';
import { starterBlock } from '@shared/questionnaire/block-starters';
import type { DraftInterview } from '../data/field-records';
import { pointId, routeId, studyId, versionId } from '../testing/field-fixtures';
import { finishedInterview } from './finished-interview';

const blocks = [starterBlock('consent', 'consent'), starterBlock('number', 'count')] as Block[];
/** A key as the device makes it (see respondent-key.spec.ts for how it is checked). */
const key = '76u6MifHS-JlJ3XZqpv4eqjw7nbM4qlkekumQi98GpE';

function draft(respondentKey: string | null | undefined): DraftInterview {
  return {
    id: '0f1e2d3c-4b5a-4968-8776-655443322110',
    studyId,
    questionnaireVersionId: versionId,
    routeId,
    pointId,
    startedAt: '2027-03-01T09:00:00.000Z',
    step: 2,
    answers: { consent: { agreed: true }, count: { value: 3 } },
    bids: {},
    gps: null,
    ...(respondentKey === undefined ? {} : { respondentKey }),
    returnedAt: null,
    updatedAt: '2027-03-01T09:08:00.000Z',
  };
}

const finish = (d: DraftInterview) =>
  finishedInterview(d, blocks, new Map(), '2027-03-01T09:08:00.000Z').interview;

describe('finishedInterview', () => {
  it('carries the respondent key the draft holds, in a form the server accepts', () => {
    const interview = finish(draft(key));
    expect(interview.respondentKey).toBe(key);
    expect(fieldInterviewSchema.safeParse(interview).success).toBe(true);
  });

  it('leaves the key out when no reference was given', () => {
    expect(finish(draft(null))).not.toHaveProperty('respondentKey');
  });

  it('leaves the key out of a draft saved before the device asked for one', () => {
    const interview = finish(draft(undefined));
    expect(interview).not.toHaveProperty('respondentKey');
    expect(fieldInterviewSchema.safeParse(interview).success).toBe(true);
  });
});
