// Shared steps for browser tests.
import { expect, type Page } from '@playwright/test';

export const DEMO_PASSWORD = 'bootwright-demo-2026';

export const PHONE = { width: 390, height: 844 };
export const DESK = { width: 1280, height: 800 };

/** Signs in through the form and waits for the role's home. */
export async function signInAs(page: Page, email: string, role: string, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByTestId('email').fill(email);
  await page.getByTestId('password').fill(password);
  await page.getByTestId('sign-in-submit').click();
  await expect(page.getByTestId(`home-${role}`)).toBeVisible();
}

/** Collects page errors and console errors so a test can assert there were none. */
export function watchErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  page.on('console', (m) => {
    if (m.type() === 'error' && !/status of 40[13]/.test(m.text())) errors.push(m.text());
  });
  return errors;
}

export async function signOut(page: Page) {
  await page.getByTestId('profile-button').click();
  await page.getByTestId('sign-out').click();
  await expect(page.getByTestId('sign-in-screen')).toBeVisible();
}
