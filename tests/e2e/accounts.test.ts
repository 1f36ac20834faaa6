import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { buildUser, GOOD_PASSWORD, uniqueEmail } from '../support/factories';
import type { Page } from 'playwright-core';
import { linkIn, waitForMail } from '../support/inbox';
import { openBrowser, screenshot, type BrowserSession } from '../support/browser';
import { applyTestEnv, testConfig } from '../support/test-env';
import { createDataSource } from '../../server/db/data-source';
import type { DataSource } from 'typeorm';

const appUrl = inject('appUrl');

/** The signed-in links and sign-out sit in the menu under the person's name. */
async function openAccountMenu(page: Page): Promise<void> {
  const button = page.getByRole('navigation', { name: 'Main' }).getByRole('button', { name: /^Signed in as/ });
  await button.waitFor();
  if ((await button.getAttribute('aria-expanded')) !== 'true') await button.click();
}
let browser: BrowserSession;
let dataSource: DataSource;

beforeAll(async () => {
  applyTestEnv();
  dataSource = createDataSource(testConfig().db);
  await dataSource.initialize();
  browser = await openBrowser();
});
afterAll(async () => {
  await browser?.close();
  await dataSource?.destroy();
});

describe('joining Benchwright in the browser', () => {
  it('signs up, confirms the address from the e-mail, signs in, sees the member menu and signs out', async () => {
    const { page } = browser;
    const email = uniqueEmail('joiner');

    await page.goto(`${appUrl}/join`);
    await page.getByLabel('Your name on Benchwright').fill('Priya Loopline');
    await page.getByLabel('E-mail address', { exact: true }).fill(email);
    await page.getByLabel('Password', { exact: true }).fill(GOOD_PASSWORD);
    await page.getByRole('button', { name: 'Create my account' }).click();
    await expect.poll(() => page.getByText(email).count()).toBeGreaterThan(0);
    await screenshot(page, 'join-check-inbox');

    const mail = await waitForMail(email, 'Confirm your e-mail address');
    await page.goto(
      linkIn(mail, '/verify-email')
        .toString()
        .replace(/^https?:\/\/[^/]+/, appUrl),
    );
    await page.getByText('Your e-mail address is confirmed').waitFor();
    await page.getByRole('main').getByRole('link', { name: 'Sign in' }).click();
    await page.waitForURL(/\/sign-in/);

    await page.getByLabel('E-mail address', { exact: true }).fill(email);
    await page.getByLabel('Password', { exact: true }).fill(GOOD_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();

    const nav = page.getByRole('navigation', { name: 'Main' });
    await openAccountMenu(page);
    await nav.getByRole('link', { name: 'My account' }).waitFor();
    expect(await nav.getByRole('link', { name: 'People & roles' }).count()).toBe(0);
    expect(await nav.getByRole('link', { name: 'Audit trail' }).count()).toBe(0);
    await screenshot(page, 'member-signed-in');

    await openAccountMenu(page);
    await nav.getByRole('button', { name: 'Sign out' }).click();
    await nav.getByRole('link', { name: 'Sign in' }).waitFor();
    await page.goto(`${appUrl}/account`);
    await page.waitForURL(/\/sign-in/);
  });

  it('shows an administrator the people and audit menus, and a member is kept out of them', async () => {
    const admin = await buildUser(dataSource, { role: 'admin', displayName: 'Quentin Trestle' });
    const { page } = browser;

    await page.goto(`${appUrl}/sign-in`);
    await page.getByLabel('E-mail address', { exact: true }).fill(admin.email);
    await page.getByLabel('Password', { exact: true }).fill(GOOD_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    const nav = page.getByRole('navigation', { name: 'Main' });
    await openAccountMenu(page);
    await nav.getByRole('link', { name: 'People & roles' }).click();
    await page.getByRole('table').getByText(admin.email).waitFor();
    await screenshot(page, 'admin-people');
    await openAccountMenu(page);
    await nav.getByRole('button', { name: 'Sign out' }).click();
    await nav.getByRole('link', { name: 'Sign in' }).waitFor();

    const member = await buildUser(dataSource);
    await page.goto(`${appUrl}/sign-in`);
    await page.getByLabel('E-mail address', { exact: true }).fill(member.email);
    await page.getByLabel('Password', { exact: true }).fill(GOOD_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await openAccountMenu(page);
    await nav.getByRole('link', { name: 'My account' }).waitFor();
    await page.goto(`${appUrl}/admin/people`);
    await page.waitForURL(/forbidden|\/$/);
    await openAccountMenu(page);
    await nav.getByRole('button', { name: 'Sign out' }).click();
  });

  it('shows field errors next to the fields and keeps what was typed', async () => {
    const { page } = browser;
    await page.goto(`${appUrl}/join`);
    await page.getByLabel('Your name on Benchwright').fill('Rhys Gradient');
    await page.getByLabel('E-mail address', { exact: true }).fill(uniqueEmail());
    await page.getByLabel('Password', { exact: true }).fill('qwertyuiop123');
    await page.getByRole('button', { name: 'Create my account' }).click();

    const password = page.getByLabel('Password', { exact: true });
    await expect.poll(() => password.getAttribute('aria-invalid')).toBe('true');
    const describedBy = (await password.getAttribute('aria-describedby')) ?? '';
    const descriptions = await Promise.all(describedBy.split(' ').map((id) => page.locator(`#${id}`).innerText()));
    expect(descriptions.join(' ')).toMatch(/most commonly used/);
    expect(await page.getByLabel('Your name on Benchwright').inputValue()).toBe('Rhys Gradient');
    await screenshot(page, 'join-common-password');
  });
});
