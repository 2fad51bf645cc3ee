import type { Locator, Page } from 'playwright-core';

/** Opens a Material select (by its accessible name, inside `scope`) and picks one option. */
export async function chooseOption(
  page: Page,
  scope: Locator | Page,
  selectName: string | RegExp,
  option: string | RegExp,
): Promise<void> {
  await scope.getByRole('combobox', { name: selectName }).click();
  await page.getByRole('option', { name: option }).click();
  await page.getByRole('listbox').waitFor({ state: 'detached' });
}
