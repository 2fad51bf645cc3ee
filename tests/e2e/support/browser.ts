import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type BrowserContext } from 'playwright-core';

/** Debian's chromium with the flags that keep it quiet and headless on this machine. */
const chromiumFlags = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** A phone-sized window, the size the field app is designed for. */
export const phoneViewport = { width: 360, height: 740 };

export interface BrowserSession {
  context: BrowserContext;
  close(): Promise<void>;
}

/** The app under test, as `npm test` started it. */
export function appUrl(path = '/'): string {
  const base = process.env['TEST_APP_URL'];
  if (!base) throw new Error('TEST_APP_URL is not set: run browser tests through `npm test`');
  return new URL(path, base).toString();
}

/**
 * A fresh browser profile (its own cookies, IndexedDB and service worker), so each test starts
 * as a device that never opened Fieldcurve.
 */
export async function launchBrowser(
  options: Parameters<typeof chromium.launchPersistentContext>[1] = {},
): Promise<BrowserSession> {
  const profile = mkdtempSync(join(tmpdir(), 'fieldcurve-e2e-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    args: chromiumFlags,
    viewport: phoneViewport,
    serviceWorkers: 'allow',
    ...options,
  });
  return {
    context,
    close: async () => {
      await context.close().catch(() => undefined);
      rmSync(profile, { recursive: true, force: true });
    },
  };
}
