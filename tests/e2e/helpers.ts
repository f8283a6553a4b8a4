import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'setline-demo';

/** Signs in through our own sign-in page, as a person would. */
export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

export async function expectSignedInAs(page: Page, name: string) {
  await expect(page.getByTestId('user-name')).toContainText(name);
}
