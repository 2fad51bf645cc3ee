import axe from 'axe-core';
import type { Page } from 'playwright-core';

interface Violation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

/**
 * Runs axe-core in the page and fails on any serious or critical violation, listing each with
 * the elements it concerns. axe is evaluated through the browser's debugging protocol, which the
 * app's content security policy (scripts from its own origin only) does not apply to.
 */
export async function expectNoSeriousViolations(page: Page, where: string): Promise<void> {
  // A snack bar holds its text in an aria-hidden element for its first 150 ms, then hands it to
  // its live region: check the page at rest, once no notice is still waiting to be announced.
  await page.waitForFunction(
    () => !document.querySelector('.mat-mdc-snack-bar-label > [aria-hidden="true"]'),
    undefined,
    { timeout: 5_000 },
  );
  await page.evaluate(axe.source);
  const violations = await page.evaluate(async () => {
    const result = await (
      window as unknown as { axe: { run(): Promise<{ violations: Violation[] }> } }
    ).axe.run();
    return result.violations.map(({ id, impact, help, nodes }) => ({
      id,
      impact,
      help,
      nodes: nodes.map((node) => ({ target: node.target })),
    }));
  });
  const serious = violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
  if (serious.length > 0) {
    const lines = serious.map(
      (v) =>
        `${v.impact} ${v.id}: ${v.help} — ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`,
    );
    throw new Error(`Accessibility problems on ${where}:\n${lines.join('\n')}`);
  }
}
