import { jest } from '@jest/globals';

// A browser test signs in through two servers and may wait for a service worker: minutes, not 5 s.
jest.setTimeout(120_000);
