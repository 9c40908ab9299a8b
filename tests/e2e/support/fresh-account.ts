import type { Page } from 'playwright-core';

// A builder with a brand-new account and nothing else: how a feature is shown to work beyond the demo data.

/** Signs up through the form as a new builder and waits for the (empty) workshops page. */
export async function signUp(page: Page, email: string, name = 'New Builder'): Promise<void> {
  await page.goto('/sign-in');
  await page.getByRole('tab', { name: 'Create account' }).click();
  await page.getByLabel('Your name').fill(name);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill('a long enough password');
  await page.getByRole('button', { name: 'Create account', exact: true }).click();
  await page.getByRole('heading', { name: 'Workshops', level: 1 }).waitFor();
}

/** From the workshops page: a new workshop, and in it a new project, left open on the project's page. */
export async function newWorkshopAndProject(page: Page, workshop: string, project: string): Promise<void> {
  await page.getByRole('button', { name: 'New workshop' }).first().click();
  await page.getByLabel('Workshop name').fill(workshop);
  await page.getByRole('button', { name: 'Create', exact: true }).click();
  await page.getByRole('heading', { name: 'Projects', level: 1 }).waitFor();
  await page.getByRole('button', { name: 'New project' }).first().click();
  await page.getByLabel('Project name').fill(project);
  await page.getByRole('button', { name: 'Create project' }).click();
  await page.getByRole('heading', { name: project, level: 1 }).waitFor();
}

/** From a project's page: a new frame from the cabinet-layout dialog's default layout (named, if given), left open. */
export async function newFrameFromLayout(page: Page, name?: string): Promise<void> {
  await page.getByRole('button', { name: 'From a cabinet layout' }).click();
  const dialog = page.getByTestId('cabinet-layout');
  await dialog.waitFor();
  if (name !== undefined) await dialog.getByLabel('Name').first().fill(name);
  await dialog.getByRole('button', { name: 'Create', exact: true }).click();
  await page.getByTestId('frame-editor').waitFor();
}
