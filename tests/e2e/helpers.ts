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

/**
 * Waits until React has hydrated the element (its fiber key is on the DOM node). A form filled before
 * that is reset by react-hook-form, and a click goes to the browser's native submit.
 */
export async function hydrated(page: Page, selector = 'form') {
  await page.waitForFunction((css) => {
    const element = document.querySelector(css);
    return Boolean(element && Object.keys(element).some((key) => key.startsWith('__reactFiber')));
  }, selector);
}

/** A calendar day (YYYY-MM-DD) in a time zone, days from now. */
export function dayIn(timeZone: string, offsetDays = 0) {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(
    new Date(Date.now() + offsetDays * 86_400_000),
  );
}
