import { studyStatusChangeProblem } from './study-status-change';

describe('studyStatusChangeProblem', () => {
  it('lets a draft go into the field once a questionnaire is published', () => {
    expect(studyStatusChangeProblem('draft', 'in_field', true)).toBeNull();
    expect(studyStatusChangeProblem('draft', 'in_field', false)).toBe(
      'Publish a questionnaire version before the study goes into the field',
    );
  });

  it('lets a study in the field be closed', () => {
    expect(studyStatusChangeProblem('in_field', 'closed', true)).toBeNull();
  });

  it.each([
    ['draft', 'closed', 'A study that is draft can only move to in the field'],
    ['in_field', 'draft', 'A study that is in the field can only move to closed'],
    ['closed', 'in_field', 'A closed study cannot be reopened'],
    ['closed', 'closed', 'The study is already closed'],
  ] as const)('refuses %s → %s', (from, to, message) => {
    expect(studyStatusChangeProblem(from, to, true)).toBe(message);
  });
});
