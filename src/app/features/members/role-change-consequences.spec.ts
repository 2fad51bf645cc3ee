import { roleChangeConsequences } from './role-change-consequences';

describe('roleChangeConsequences', () => {
  it('says nothing when no role is taken away', () => {
    expect(roleChangeConsequences(['enumerator'], ['enumerator', 'client'])).toEqual([]);
  });

  it('names the roles taken away and that they go from every study', () => {
    const said = roleChangeConsequences(['researcher', 'supervisor'], ['enumerator']);
    expect(said[0]).toContain('researcher and supervisor in every study');
  });

  it('warns that taking the client role revokes the access tokens', () => {
    const said = roleChangeConsequences(['client'], ['enumerator']);
    expect(said.some((sentence) => sentence.includes('access tokens are revoked'))).toBe(true);
  });
});
