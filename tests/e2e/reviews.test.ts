import { randomBytes } from 'node:crypto';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { ListingActor } from '../../server/features/listings/listing-actor';
import { reviewOrder } from '../../server/features/reviews/order-reviews.service';
import type { User } from '../../server/features/users/user.entity';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { buildListedListing } from '../support/listing-factories';
import { buildPaidOutOrder } from '../support/order-factories';
import { startTestApp } from '../support/test-app';

const appUrl = inject('appUrl');
const XSS = '<img src=x onerror="window.__reviewXss=1"><script>window.__reviewXss=1</script> Clumsy packing.';
let app: AppInstance;

beforeAll(async () => {
  app = await startTestApp();
});
afterAll(() => app?.close());

const actor = (user: User): ListingActor => ({ id: user.id, role: user.role, ip: '127.0.0.1' });

/** A seller with a listed module and three paid-out orders rated 5, 4 and 2 (the 2 carrying markup). */
async function ratedSeller() {
  const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator', displayName: 'Ivo Ballast' });
  const token = `Throat${randomBytes(4).toString('hex')}`;
  const seller = await buildUser(app.ctx.dataSource, { displayName: `Peggy Trestle ${token.slice(6)}` });
  const listing = await buildListedListing(app.ctx, seller, moderator, { title: `${token} station module` });
  const ratings: [number, string][] = [
    [5, 'Lovely soldering under the board, and the DCC bus was labelled.'],
    [4, 'Good module; one cross member needed a screw.'],
    [2, XSS],
  ];
  for (const [i, [stars, text]] of ratings.entries()) {
    const buyer = await buildUser(app.ctx.dataSource, { displayName: `Buyer ${i + 1} ${token.slice(6)}` });
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);
    await reviewOrder(app.ctx, actor(buyer), order.id, { stars, text });
  }
  return { moderator, seller, listing, token };
}

async function noScriptRan(page: Page): Promise<void> {
  expect(await page.evaluate(() => (globalThis as unknown as { __reviewXss?: number }).__reviewXss)).toBeUndefined();
}

describe.each([
  ['desktop', { width: 1280, height: 900 }],
  ['phone', { width: 375, height: 740 }],
])('ratings and reviews on a %s', (name, viewport) => {
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(() => browser?.close());

  it('shows the seller’s rating on cards, the listing and the profile, with review text shown as text', async () => {
    const { seller, listing, token } = await ratedSeller();
    const { page } = browser;

    await page.goto(`${appUrl}/modules?q=${token}`);
    const card = page.locator('article', { hasText: listing.title });
    // (5 + 4 + 2) / 3 = 3.666… → 3.7 (arithmetic mean, common practice, no source)
    await card.getByText('3.7 from 3 ratings').waitFor();
    await screenshot(page, `reviews-search-${name}`);

    await page.goto(`${appUrl}/modules/${listing.id}`);
    const sellerBox = page.getByRole('region', { name: 'Seller' });
    await sellerBox.getByText('3.7 from 3 ratings').waitFor();
    await page.waitForLoadState('networkidle');
    await screenshot(page, `reviews-listing-${name}`);
    await sellerBox.getByRole('link', { name: seller.displayName }).click();

    await page.waitForURL(`${appUrl}/members/${seller.id}`);
    await page.getByRole('heading', { level: 1, name: seller.displayName }).waitFor();
    await page.locator('.member-page__header').getByText('3.7 from 3 ratings').waitFor();
    const reviews = page.getByRole('region', { name: 'What other members say' });
    await reviews.getByText(XSS, { exact: true }).waitFor();
    expect(await reviews.locator('img, script').count()).toBe(0);
    await noScriptRan(page);
    await page
      .getByRole('region', { name: `Listed by ${seller.displayName}` })
      .getByText(listing.title)
      .waitFor();
    await page.waitForLoadState('networkidle');
    await screenshot(page, `reviews-profile-${name}`);
  });

  it('lets the buyer rate a paid-out purchase from the order page, once', async () => {
    const buyer = await buildUser(app.ctx.dataSource, { displayName: 'Nell Fishplate' });
    const seller = await buildUser(app.ctx.dataSource, { displayName: `Amos Chair ${randomBytes(3).toString('hex')}` });
    const order = await buildPaidOutOrder(app.ctx.dataSource, buyer, seller);
    const { page } = browser;
    await browser.context.clearCookies();
    await signInThroughPage(page, appUrl, buyer.email, GOOD_PASSWORD);

    await page.goto(`${appUrl}/orders/${order.id}`);
    const form = page.getByRole('region', { name: 'Rate this purchase' });
    await form.getByRole('button', { name: 'Send my rating' }).click();
    await form.getByText('Choose from 1 to 5 stars.').waitFor();
    await form.getByLabel('4 stars: Good').check();
    await form.getByLabel('A few words').fill('Collected on time; the <em>fiddle yard</em> joined first go.');
    await screenshot(page, `reviews-order-form-${name}`);
    await form.getByRole('button', { name: 'Send my rating' }).click();
    await form.getByText('Thank you. You gave the seller').waitFor();
    await form.getByText('Collected on time; the <em>fiddle yard</em> joined first go.').waitFor();
    expect(await form.locator('em').count()).toBe(0);
    expect(await form.getByRole('button', { name: 'Send my rating' }).count()).toBe(0);

    await page.goto(`${appUrl}/members/${seller.id}`);
    await page.locator('.member-page__header').getByText('4.0 from 1 rating').waitFor();
  });

  it('lets a moderator hide an abusive review, which leaves the profile and the average', async () => {
    const { moderator, seller } = await ratedSeller();
    const { page } = browser;
    await browser.context.clearCookies();
    await signInThroughPage(page, appUrl, moderator.email, GOOD_PASSWORD);

    await page.goto(`${appUrl}/review`);
    await page.getByRole('link', { name: 'Member reviews: hide abusive ones' }).click();
    await page.waitForURL(`${appUrl}/review/reviews`);
    const item = page.locator('article', { hasText: seller.displayName }).filter({ hasText: 'Clumsy packing.' });
    await item.getByText(XSS, { exact: true }).waitFor();
    await noScriptRan(page);
    await screenshot(page, `reviews-moderation-${name}`);
    await item.getByRole('button', { name: /^Hide…/ }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('button', { name: 'Hide this review' }).click();
    await dialog.getByText('The reason must be at least 3 characters.').waitFor();
    await screenshot(page, `reviews-hide-dialog-${name}`);
    await dialog.getByLabel('Reason').fill('Markup instead of a description of the sale.');
    await dialog.getByRole('button', { name: 'Hide this review' }).click();
    await item.getByText('Hidden', { exact: true }).waitFor();
    await item.getByText(/Markup instead of a description/).waitFor();

    await page.goto(`${appUrl}/members/${seller.id}`);
    // Without the 2: (5 + 4) / 2 = 4.5.
    await page.locator('.member-page__header').getByText('4.5 from 2 ratings').waitFor();
    const reviews = page.getByRole('region', { name: 'What other members say' });
    await reviews.getByText('Good module; one cross member needed a screw.').waitFor();
    expect(await reviews.getByText('Clumsy packing.').count()).toBe(0);
  });
});
