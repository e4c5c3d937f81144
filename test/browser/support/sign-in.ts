import type { Page } from 'playwright-core';

/** Signs in through the real form, the way a person does. */
export async function signInThroughForm(
  page: Page,
  email: string,
  password: string,
): Promise<void> {
  await page.waitForURL(/\/sign-in/);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/**
 * The first load of a signed-out browser asks the server to continue a session and is told 401:
 * expected, so tests ignore exactly that and nothing else.
 */
export function unexpected(problems: string[]): string[] {
  return problems.filter((problem) => !/401 \(Unauthorized\)|status of 401/.test(problem));
}
