import type { Page } from 'playwright-core';

// A brand-new account (no demo data) with one workshop and one empty project, as a builder starts.

const stamp = Date.now().toString(36);

/** Sign up as a new builder; `who` keeps the e-mail of each test its own. */
export async function signUp(page: Page, who = 'builder'): Promise<void> {
  await page.goto('/sign-in');
  await page.getByRole('tab', { name: 'Create account' }).click();
  await page.getByLabel('Your name').fill('New Builder');
  await page.getByLabel('E-mail').fill(`${who}-${stamp}@example.test`);
  await page.getByLabel('Password', { exact: true }).fill('a long enough password');
  await page.getByRole('button', { name: 'Create account', exact: true }).click();
  await page.getByRole('heading', { name: 'Workshops', level: 1 }).waitFor();
}

/** A workshop and an empty project \u201cMy galley\u201d, opened. */
export async function newProject(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'New workshop' }).first().click();
  await page.getByLabel('Workshop name').fill(`Van shop ${stamp}`);
  await page.getByRole('button', { name: 'Create', exact: true }).click();
  await page.getByRole('heading', { name: 'Projects', level: 1 }).waitFor();
  await page.getByRole('button', { name: 'New project' }).first().click();
  await page.getByLabel('Project name').fill('My galley');
  await page.getByRole('button', { name: 'Create project' }).click();
  await page.getByRole('heading', { name: 'My galley', level: 1 }).waitFor();
}

