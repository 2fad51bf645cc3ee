import { TestBed } from '@angular/core/testing';
import { sessionInfoWith } from '../testing/sign-in-as';
import { SessionCache } from './session-cache';

describe('SessionCache', () => {
  let cache: SessionCache;

  beforeEach(async () => {
    cache = TestBed.inject(SessionCache);
    await cache.forget();
  });

  it('gives back the enumerator session it kept, across instances', async () => {
    const info = sessionInfoWith(['enumerator', 'supervisor']);
    await cache.remember(info);
    expect(await new SessionCache().recall()).toEqual(info);
  });

  it('keeps no session of someone who is not an enumerator, and drops the earlier one', async () => {
    await cache.remember(sessionInfoWith(['enumerator']));
    await cache.remember(sessionInfoWith(['admin']));
    expect(await cache.recall()).toBeNull();
  });

  it('forgets the session on request', async () => {
    await cache.remember(sessionInfoWith(['enumerator']));
    await cache.forget();
    expect(await cache.recall()).toBeNull();
  });
});
