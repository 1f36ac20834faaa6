import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Order } from '../../server/features/orders/order.entity';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { EVERY_WAY } from '../support/checkout-fixtures';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { buildListedListing } from '../support/listing-factories';
import { startTestApp } from '../support/test-app';

const appUrl = inject('appUrl');
let app: AppInstance;

beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app?.close());

/** WCAG 2.2 A and AA rules as axe-core tags them (UX.md line 23). */
async function violations(page: Page): Promise<string[]> {
  const result = await new AxeBuilder({ page })
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'])
    .analyze();
  return result.violations.map((v) => `${v.impact}: ${v.id} — ${v.help} (${v.nodes.length})`);
}

/** The focused element's accessible text: its label, or what it says. */
const focusedText = (page: Page) =>
  page.evaluate<string>(
    `(() => { const el = document.activeElement; if (!el) return '';
      return (el.getAttribute('aria-label') || (el.labels && el.labels[0] && el.labels[0].innerText) || el.innerText || '').trim(); })()`,
  );

/** Press Tab until the focused element's text matches, as a keyboard user would; fail after `limit` presses. */
async function tabTo(page: Page, name: RegExp, limit = 120): Promise<void> {
  for (let i = 0; i < limit; i += 1) {
    await page.keyboard.press('Tab');
    if (name.test(await focusedText(page))) return;
  }
  throw new Error(`Tab never reached ${name}`);
}

describe('buying with the keyboard alone (WCAG 2.1.1)', () => {
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await openBrowser({ width: 1280, height: 900 });
  });
  afterAll(() => browser?.close());

  it('reserves and pays for a module without the mouse, and the pages on the way pass axe', async () => {
    const ds = app.ctx.dataSource;
    const seller = await buildUser(ds, { displayName: 'Cattersby Loco Shed Group' });
    const moderator = await buildUser(ds, { role: 'moderator' });
    const listing = await buildListedListing(app.ctx, seller, moderator, {
      ...EVERY_WAY,
      title: 'OO gauge two-road engine shed board',
    });
    const buyer = await buildUser(ds, { displayName: 'Wilf Keyboardson' });
    const { page } = browser;
    await signInThroughPage(page, appUrl, buyer.email, GOOD_PASSWORD);

    await page.goto(`${appUrl}/modules/${listing.id}`);
    await page.getByRole('link', { name: 'Buy this module' }).waitFor();
    await tabTo(page, /^Buy this module$/);
    await page.keyboard.press('Enter');
    await page.waitForURL(`${appUrl}/modules/${listing.id}/buy`);
    await page.getByTestId('checkout-total').waitFor();
    expect(await violations(page), 'checkout').toEqual([]);

    // Collection is one of the radio choices: reach the group, then Space picks the focused choice.
    await tabTo(page, /Collect it from the seller/);
    await page.keyboard.press('Space');
    await tabTo(page, /Reserve it and go to payment/);
    await page.keyboard.press('Enter');

    await page.getByRole('radio', { name: /Card that pays/ }).waitFor();
    expect(await violations(page), 'payment').toEqual([]);
    await tabTo(page, /Card that pays/);
    await page.keyboard.press('Space');
    await tabTo(page, /^Pay £/);
    await page.keyboard.press('Enter');

    await page.waitForURL(/\/orders\/\d+$/, { timeout: 30_000 });
    await page.locator('main h1').first().waitFor();
    await expect
      .poll(async () => (await ds.getRepository(Order).findOneByOrFail({ listingId: listing.id })).state, {
        timeout: 30_000,
      })
      .toBe('paid_held');
    await page.waitForLoadState('networkidle');
    expect(await violations(page), 'order').toEqual([]);
    await screenshot(page, 'keyboard-purchase-order');

    for (const path of ['/orders', '/my/balances', '/messages', '/quotes']) {
      await page.goto(`${appUrl}${path}`);
      await page.locator('main h1').first().waitFor();
      await page.waitForLoadState('networkidle');
      expect(await violations(page), path).toEqual([]);
    }
  });

  it('has no WCAG 2.2 AA violation on the moderation and fee pages', async () => {
    const admin = await buildUser(app.ctx.dataSource, { role: 'admin', displayName: 'Hester Gradient' });
    const { page } = browser;
    await page.context().clearCookies();
    await signInThroughPage(page, appUrl, admin.email, GOOD_PASSWORD);
    for (const path of ['/review/problems', '/review/reviews', '/review/messages', '/admin/fees']) {
      await page.goto(`${appUrl}${path}`);
      await page.locator('main h1').first().waitFor();
      await page.waitForLoadState('networkidle');
      expect(await violations(page), path).toEqual([]);
      await screenshot(page, `a11y${path.replaceAll('/', '-')}`);
    }
  });
});
