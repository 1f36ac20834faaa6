import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { openBrowser, screenshot, type BrowserSession, signInThroughPage } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { testConfig } from '../support/test-env';

const appUrl = inject('appUrl');
let dataSource: DataSource;

beforeAll(async () => {
  dataSource = createDataSource(testConfig().db);
  await dataSource.initialize();
});
afterAll(() => dataSource?.destroy());

/** WCAG 2.2 A and AA rules as axe-core tags them (UX.md line 23). */
async function violations(page: Page) {
  const result = await new AxeBuilder({ page })
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'])
    .analyze();
  return result.violations.map((v) => `${v.impact}: ${v.id} — ${v.help} (${v.nodes.length})`);
}

const signIn = (page: Page, email: string) => signInThroughPage(page, appUrl, email, GOOD_PASSWORD);

describe.each([
  ['desktop', { width: 1280, height: 900 }],
  ['phone', { width: 375, height: 740 }],
])('the foundation pages on a %s', (name, viewport) => {
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(() => browser?.close());

  it.each(['/', '/modules', '/planner', '/sign-in', '/join', '/forgot-password', '/no-such-page'])(
    'has no WCAG 2.2 AA violation that axe can find on %s',
    async (path) => {
      await browser.page.goto(`${appUrl}${path}`);
      await browser.page.locator('main h1').first().waitFor();
      expect(await violations(browser.page)).toEqual([]);
    },
  );

  it('has no WCAG 2.2 AA violation on the signed-in pages of an administrator', async () => {
    const admin = await buildUser(dataSource, { role: 'admin', displayName: 'Ursula Axle' });
    const { page } = browser;
    await signIn(page, admin.email);
    for (const path of [
      '/account',
      '/admin/people',
      '/audit',
      '/sell',
      '/my/listings',
      '/review',
      '/plans',
      '/my/shortlist',
    ]) {
      await page.goto(`${appUrl}${path}`);
      await page.locator('main h1').first().waitFor();
      await page.getByText(/Loading/).waitFor({ state: 'detached' });
      expect(await violations(page), path).toEqual([]);
      await screenshot(page, `${name}${path.replaceAll('/', '-')}`);
    }
  });

  it('fits the page width without sideways scrolling', async () => {
    const { page } = browser;
    await page.goto(`${appUrl}/`);
    const overflow = await page.evaluate<number>(
      'document.documentElement.scrollWidth - document.documentElement.clientWidth',
    );
    expect(overflow).toBeLessThanOrEqual(0);
    await screenshot(page, `${name}-home`);
  });
});
