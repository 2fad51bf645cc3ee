import type { Request, Response } from 'express';
import type { Database } from '../db/database';
import { HttpError } from '../http/http-error';
import { accessGuard, openOnlyTo } from './access-guard';
import type { Actor } from './actor';

const client: Actor = {
  userId: '5d0c1b7a-3e2f-4a9b-8c6d-1e2f3a4b5c6d',
  organisationId: '9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6d',
  organisationName: 'Lowland Pricing Trust',
  email: 'client@example.test',
  name: 'Tamsin Reedbury',
  roles: ['client'],
};

async function refusalOf(method: string, path: string, actor: Actor): Promise<HttpError> {
  const req = { method, baseUrl: '', path, originalUrl: path } as Request;
  const res = { locals: { actor } } as unknown as Response;
  try {
    await accessGuard({} as Database)(req, res, () => undefined);
  } catch (error) {
    if (error instanceof HttpError) return error;
    throw error;
  }
  throw new Error('the guard let the call through');
}

describe('openOnlyTo', () => {
  it('names one role in plain words', () => {
    expect(openOnlyTo(['admin'])).toBe('This is open to administrators only.');
  });

  it('lists several roles as a sentence, keeping their order', () => {
    expect(openOnlyTo(['researcher', 'supervisor'])).toBe(
      'This is open to researchers and supervisors only.',
    );
    expect(openOnlyTo(['supervisor', 'researcher', 'enumerator'])).toBe(
      'This is open to supervisors, researchers and enumerators only.',
    );
  });

  it('says when the role is needed in the study itself', () => {
    expect(openOnlyTo(['supervisor'], 'in this study')).toBe(
      'This is open to supervisors only in this study.',
    );
  });
});

describe('accessGuard', () => {
  it('refuses a member without the role with the plain sentence', async () => {
    const error = await refusalOf('GET', '/api/members', client);
    expect(error.status).toBe(403);
    expect(error.code).toBe('forbidden');
    expect(error.message).toBe('This is open to administrators only.');
  });
});
