import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Page } from 'playwright-core';

// Browser tests run from the checkout's root (npm test sets the working directory).
const folder = resolve('test-results', 'screenshots');

/**
 * A whole-page screenshot in test-results/screenshots/NAME.png, for a person to look at. The
 * signed-in shell scrolls inside its content pane, not the window, so the window is stretched to
 * the content's height for the picture and then put back.
 */
export async function screenshot(page: Page, name: string): Promise<void> {
  mkdirSync(folder, { recursive: true });
  const viewport = page.viewportSize();
  const overflow = await page.evaluate(() => {
    const pane = document.querySelector('mat-sidenav-content');
    return pane ? pane.scrollHeight - pane.clientHeight : 0;
  });
  if (viewport && overflow > 0) {
    await page.setViewportSize({
      width: viewport.width,
      height: Math.min(viewport.height + overflow, 6000),
    });
  }
  try {
    await page.screenshot({ path: join(folder, `${name}.png`), fullPage: true });
  } finally {
    if (viewport && overflow > 0) {
      await page.setViewportSize(viewport);
      // Let the layout settle before the test clicks on something again.
      await page.evaluate(
        () => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))),
      );
    }
  }
}
