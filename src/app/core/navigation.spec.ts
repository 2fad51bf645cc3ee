import type { Role } from '@shared/auth/roles';
import { navGroupsFor } from './navigation';

function labelsFor(roles: Role[]): string[] {
  return navGroupsFor(roles).flatMap((group) => group.items.map((item) => item.label));
}

describe('navGroupsFor', () => {
  it('gives an administrator Home, field devices, Members, access tokens and System health', () => {
    expect(labelsFor(['admin'])).toEqual([
      'Home',
      'Devices',
      'Members',
      'Access tokens',
      'System health',
    ]);
  });

  it('puts the administration pages under their own heading', () => {
    expect(navGroupsFor(['admin']).map((group) => group.title)).toEqual([
      null,
      'Supervision',
      'Administration',
    ]);
  });

  it('gives a researcher their studies, the field plans to read and the analysis pages', () => {
    expect(labelsFor(['researcher'])).toEqual(['Home', 'Studies', 'Field planning', 'Analysis']);
  });

  it('gives a client the studies shared with them and their reports', () => {
    expect(labelsFor(['client'])).toEqual(['Home', 'Studies', 'Reports']);
  });

  it('gives an enumerator their routes and the sync page under Field work', () => {
    expect(labelsFor(['enumerator'])).toEqual(['Home', 'My routes', 'Sync']);
    expect(navGroupsFor(['enumerator']).map((group) => group.title)).toEqual([null, 'Field work']);
  });

  it('gives a supervisor field planning, the review queue and the field devices', () => {
    expect(labelsFor(['supervisor'])).toEqual([
      'Home',
      'Studies',
      'Field planning',
      'Review',
      'Devices',
    ]);
  });

  it('shows a person with several roles the union, each entry once', () => {
    expect(labelsFor(['researcher', 'admin'])).toEqual([
      'Home',
      'Studies',
      'Field planning',
      'Devices',
      'Analysis',
      'Members',
      'Access tokens',
      'System health',
    ]);
  });

  it('still offers Home to someone with no role', () => {
    expect(labelsFor([])).toEqual(['Home']);
  });
});
