import { rolesBeyondOrganisation, studyMemberUpdateSchema } from './study-member';

describe('study members', () => {
  it('takes study roles and refuses administration as a study role', () => {
    expect(studyMemberUpdateSchema.safeParse({ roles: ['supervisor', 'enumerator'] }).success).toBe(
      true,
    );
    expect(studyMemberUpdateSchema.safeParse({ roles: ['admin'] }).success).toBe(false);
    expect(studyMemberUpdateSchema.safeParse({ roles: [] }).error?.issues[0].message).toBe(
      'Choose at least one role',
    );
  });

  it('finds the study roles a person does not hold in the organisation', () => {
    expect(rolesBeyondOrganisation(['supervisor', 'enumerator'], ['enumerator'])).toEqual([
      'supervisor',
    ]);
    expect(rolesBeyondOrganisation(['client'], ['client', 'admin'])).toEqual([]);
  });
});
