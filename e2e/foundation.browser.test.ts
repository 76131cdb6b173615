import { existsSync, statSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';

describe('a newcomer in Chromium', () => {
  const h = useServerAndBrowser();

  it('signs up, creates a group, signs out and in again, and sees the empty notebooks page', async () => {
    const context = await h.browser.newContext({ viewport: { width: 1280, height: 860 } });
    const page = await context.newPage();
    const errors = watchErrors(page);

    await page.goto(h.server.url);
    await page.waitForURL('**/sign-in');
    await page.getByRole('link', { name: 'Create an account' }).click();
    await page.getByLabel('Name').fill('Rosa Quintero');
    await page.getByLabel('E-mail').fill('rosa.quintero@example.org');
    await page.getByLabel('Password').fill('upwelling season');
    await page.getByRole('button', { name: 'Create account' }).click();

    await page.getByRole('heading', { name: 'Start by creating your research group' }).waitFor();
    await page.getByLabel('Group name').fill('Tropical carbon dynamics');
    await page.getByRole('button', { name: 'Create group' }).click();
    await page.getByRole('heading', { name: 'No notebooks yet' }).waitFor();

    await page.getByRole('link', { name: 'Account' }).click();
    await page.getByRole('button', { name: 'Sign out everywhere' }).click();
    await page.waitForURL('**/sign-in');

    await page.getByLabel('E-mail').fill('rosa.quintero@example.org');
    await page.getByLabel('Password').fill('upwelling season');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/notebooks');
    await page.getByRole('heading', { name: 'No notebooks yet' }).waitFor();
    expect(await page.getByRole('combobox', { name: 'Research group' }).textContent()).toContain('Tropical carbon dynamics');
    expect(await page.getByRole('button', { name: 'New notebook' }).isVisible()).toBe(true);

    const shot = await screenshot(page, 'foundation-empty-notebooks');
    expect(existsSync(shot) && statSync(shot).size > 10_000).toBe(true);
    expect(errors).toEqual([]);
    await context.close();
  });

  it('shows a clear message for a wrong password and stays on the sign-in page', async () => {
    const context = await h.browser.newContext();
    const page = await context.newPage();
    await page.goto(`${h.server.url}/sign-in`);
    await page.getByLabel('E-mail').fill('nobody@example.org');
    await page.getByLabel('Password').fill('wrong password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await expect(page.getByRole('alert').textContent()).resolves.toContain('The e-mail or the password is wrong');
    expect(page.url()).toContain('/sign-in');
    await context.close();
  });
});
