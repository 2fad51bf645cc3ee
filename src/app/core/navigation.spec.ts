import type { Role } from '@shared/auth/roles';
import { navGroupsFor } from './navigation';

function labelsFor(roles: Role[]): string[] {
  return navGroupsFor(roles).flatMap((group) => group.items.map((item) => item.label));
}

describe('navGroupsFor', () => {
  it('gives an administrator Home, Members and System health', () => {
    expect(labelsFor(['admin'])).toEqual(['Home', 'Members', 'System health']);
  });

  it('puts the administration pages under their own heading', () => {
    expect(navGroupsFor(['admin']).map((group) => group.title)).toEqual([null, 'Administration']);
  });

  it.each<Role>(['researcher', 'supervisor', 'enumerator', 'client'])(
    'shows a %s only Home while their sections have no pages yet',
    (role) => {
      expect(labelsFor([role])).toEqual(['Home']);
    },
  );

  it('shows a person with several roles the union, each entry once', () => {
    expect(labelsFor(['researcher', 'admin'])).toEqual(['Home', 'Members', 'System health']);
  });

  it('still offers Home to someone with no role', () => {
    expect(labelsFor([])).toEqual(['Home']);
  });
});
