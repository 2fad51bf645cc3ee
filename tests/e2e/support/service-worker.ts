import type { Page } from 'playwright-core';

/**
 * Waits until the Angular service worker controls the page and holds every file of its
 * prefetched `app` group, so the app opens with the network cut.
 */
export async function waitForOfflineReady(page: Page, timeoutMs = 60_000): Promise<void> {
  await page.evaluate(() => navigator.serviceWorker.ready.then(() => true));
  if (!(await page.evaluate(() => navigator.serviceWorker.controller !== null))) {
    await page.reload();
  }
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const missing = await page.evaluate(async () => {
      const manifest = (await (await fetch('/ngsw.json')).json()) as {
        assetGroups: { name: string; urls: string[] }[];
      };
      const urls = manifest.assetGroups.find((group) => group.name === 'app')?.urls ?? [];
      const absent: string[] = [];
      for (const url of urls) if (!(await caches.match(url))) absent.push(url);
      return absent;
    });
    if (missing.length === 0) return;
    if (Date.now() > deadline) {
      throw new Error(`The service worker did not cache: ${missing.slice(0, 5).join(', ')}…`);
    }
    await page.waitForTimeout(500);
  }
}
