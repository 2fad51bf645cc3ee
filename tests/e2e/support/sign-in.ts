import type { Page } from 'playwright-core';
import { demoPassword } from '../../../server/demo/demo-people';
import { appUrl } from './browser';

/** The local identity provider `npm test` started; its pages are on another port of the host. */
const issuerUrl = process.env['OIDC_ISSUER']!;

/**
 * Signs in as a person would: the landing page's Sign in button, the provider's form, and back
 * to the app's home page.
 */
export async function signIn(page: Page, email: string, password = demoPassword): Promise<void> {
  await page.goto(appUrl('/'));
  await page.getByRole('link', { name: 'Sign in' }).click();
  await page.waitForURL((url) => url.href.startsWith(`${issuerUrl}/interaction/`));
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(appUrl('/'));
  await page.getByRole('heading', { level: 1, name: /^Welcome/ }).waitFor();
}

/** Signs out through the account menu and waits for the signed-out landing page. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: /^Account of / }).click();
  await page.getByRole('menuitem', { name: 'Sign out', exact: true }).click();
  await page.getByRole('link', { name: 'Sign in' }).waitFor();
}

/** Whether the side navigation offers a link with exactly this accessible name. */
export async function navigationOffers(page: Page, label: string): Promise<boolean> {
  const navigation = page.getByRole('navigation', { name: 'Sections' });
  await navigation.getByRole('link').first().waitFor();
  return (await navigation.getByRole('link', { name: label, exact: true }).count()) === 1;
}
