import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { openBrowser, screenshot, type BrowserSession, signInThroughPage } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { buildListedListing } from '../support/listing-factories';
import { startTestApp } from '../support/test-app';

const appUrl = inject('appUrl');
let app: AppInstance;

beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app?.close());

const signIn = (page: Page, email: string) => signInThroughPage(page, appUrl, email, GOOD_PASSWORD);

describe.each([
  ['desktop', { width: 1280, height: 900 }],
  ['phone', { width: 375, height: 740 }],
])('the shortlist on a %s', (name, viewport) => {
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(() => browser?.close());

  it('keeps a listing and a search, and shows both on the shortlist page', async () => {
    const seller = await buildUser(app.ctx.dataSource, { displayName: 'Wilf Sleeper' });
    const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
    const title = `Shortlisted ${name} terminus module`;
    const listing = await buildListedListing(app.ctx, seller, moderator, { title });
    const buyer = await buildUser(app.ctx.dataSource, { displayName: 'Xanthe Points' });
    const { page } = browser;
    await signIn(page, buyer.email);

    await page.goto(`${appUrl}/modules/${listing.id}`);
    const keep = page.getByRole('button', { name: /Keep on my shortlist/ });
    await keep.click();
    await expect.poll(() => keep.getAttribute('aria-pressed')).toBe('true');

    await page.goto(`${appUrl}/modules?q=terminus`);
    await page.getByRole('button', { name: 'Save this search' }).click();
    await page.getByLabel('Name of the search').fill(`Termini (${name})`);
    await page.getByRole('button', { name: 'Save and e-mail me' }).click();
    await page.getByRole('status').getByText('Saved.').waitFor();

    await page.goto(`${appUrl}/my/shortlist`);
    await page.getByRole('main').getByText(title).waitFor();
    await page.getByRole('main').getByText(`Termini (${name})`).waitFor();
    await screenshot(page, `shortlist-${name}`);
  });
});
