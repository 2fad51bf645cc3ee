import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Page } from 'playwright-core';

// Browser tests run from the checkout's root (npm test sets the working directory).
const folder = resolve('test-results', 'screenshots');

/** A full-page screenshot in test-results/screenshots/NAME.png, for a person to look at. */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(folder, { recursive: true });
  await page.screenshot({ path: join(folder, `${name}.png`), fullPage: true });
}
