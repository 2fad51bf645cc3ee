import { TestBed } from '@angular/core/testing';
import { HttpTestingController } from '@angular/common/http/testing';
import type { Role } from '@shared/auth/roles';
import type { SessionInfo } from '@shared/auth/session';
import { Session } from '../core/session';

/** A session as `GET /api/session` would send it, for an invented person. */
export function sessionInfoWith(roles: Role[]): SessionInfo {
  return {
    user: {
      id: '7d1f6c2e-4b0a-4c55-9d1e-0f6a2b3c4d5e',
      email: 'ines.okafor@example.org',
      name: 'Ines Okafor',
    },
    organisation: { id: '2a9e5b7c-1d3f-4e60-8a2b-3c4d5e6f7a8b', name: 'Kestrel Field Research' },
    roles,
    csrfToken: 'test-csrf-token-0123456789abcdef',
  };
}

/** Signs the test's Session in through its public path: it asks, the fake server answers. */
export async function signInAs(roles: Role[]): Promise<SessionInfo> {
  const info = sessionInfoWith(roles);
  const loaded = TestBed.inject(Session).ensureLoaded();
  TestBed.inject(HttpTestingController).expectOne('/api/session').flush(info);
  await loaded;
  return info;
}
