import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { raiseProblem } from '../../server/features/orders/order-moves.service';
import { Order } from '../../server/features/orders/order.entity';
import { WORKED_EXAMPLE } from '../support/aftercare-fixtures';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { waitForMail } from '../support/inbox';
import { buildListedListing } from '../support/listing-factories';
import { buildOrder } from '../support/order-factories';
import { startTestApp } from '../support/test-app';

const appUrl = inject('appUrl');
let app: AppInstance;
const browsers: BrowserSession[] = [];

beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => {
  for (const b of browsers) await b.close();
  await app?.close();
});

async function browserFor(email: string): Promise<Page> {
  const session = await openBrowser();
  browsers.push(session);
  await signInThroughPage(session.page, appUrl, email, GOOD_PASSWORD);
  return session.page;
}

/** A full-page screenshot at 1280 px and again at 375 px. */
async function bothWidths(page: Page, name: string): Promise<void> {
  await screenshot(page, `${name}-1280`);
  await page.setViewportSize({ width: 375, height: 740 });
  await page.waitForTimeout(200);
  await screenshot(page, `${name}-375`);
  await page.setViewportSize({ width: 1280, height: 900 });
}

describe('buying a published module, from payment to the seller’s payout', () => {
  it('pays with the test card, is sent, is confirmed received, pays the seller, and e-mails every step', async () => {
    const ds = app.ctx.dataSource;
    const seller = await buildUser(ds, { displayName: 'Ashby Road Benchworks' });
    const buyer = await buildUser(ds, { displayName: 'Imogen Chairbolt' });
    const moderator = await buildUser(ds, { role: 'moderator' });
    const title = 'N gauge station throat, two boards';
    const listing = await buildListedListing(app.ctx, seller, moderator, { ...WORKED_EXAMPLE, title });

    // The seller connects a payout account before their first sale, on the provider's onboarding page.
    const sellerPage = await browserFor(seller.email);
    await sellerPage.goto(`${appUrl}/my/balances`);
    await sellerPage.getByRole('button', { name: 'Connect a payout account' }).click();
    await sellerPage.getByRole('button', { name: 'Complete onboarding' }).click();
    await sellerPage.waitForURL(`${appUrl}/my/balances?connected=1`);
    await expect.poll(() => sellerPage.getByText('Your payout account is connected and ready.').count()).toBe(1);

    // The buyer buys it with the card that pays, to be brought by the seller (£240 + £35).
    const buyerPage = await browserFor(buyer.email);
    await buyerPage.goto(`${appUrl}/modules/${listing.id}`);
    await buyerPage.getByRole('link', { name: 'Buy this module' }).click();
    await buyerPage.getByRole('radio', { name: /The seller delivers it/ }).check();
    await buyerPage
      .getByLabel('Delivery address', { exact: true })
      .fill('Imogen Chairbolt\n9 Fishplate Close\nNantwich\nCW5 7DD');
    await buyerPage.getByRole('button', { name: 'Reserve it and go to payment' }).click();
    await buyerPage.getByRole('radio', { name: /Card that pays/ }).check();
    await buyerPage.getByRole('button', { name: 'Pay £275.00' }).click();
    await buyerPage.waitForURL(/\/orders\/\d+$/, { timeout: 30_000 });
    const order = await ds.getRepository(Order).findOneByOrFail({ listingId: listing.id });

    // The seller sees the commission and their payout, and marks it as sent.
    await sellerPage.goto(`${appUrl}/orders/${order.id}`);
    await sellerPage.getByText('You receive').waitFor();
    expect(await sellerPage.locator('.order-money').innerText()).toMatch(
      /Benchwright keeps \(8\.00\s%[^)]*\)\s*− £22\.00/,
    );
    await sellerPage.getByRole('button', { name: 'Mark as sent' }).click();
    const sendDialog = sellerPage.getByRole('dialog');
    await sendDialog.getByLabel('Note for the buyer').fill('Coming in the club van on Saturday morning.');
    await sendDialog.getByRole('button', { name: 'Mark as sent' }).click();
    await sellerPage.getByText('Marked as sent. The buyer has been told.').waitFor();
    await bothWidths(sellerPage, 'order-seller');

    // The buyer confirms it arrived as described: a summary, and an explicit tick before money is released.
    await buyerPage.reload();
    await buyerPage.getByRole('button', { name: 'Confirm it arrived as described' }).click();
    const confirm = buyerPage.getByRole('dialog');
    expect(await confirm.innerText()).toMatch(
      /Released from hold to Ashby Road Benchworks \(less Benchwright’s commission\)\s*£275\.00/,
    );
    await confirm.getByRole('button', { name: 'Release the money' }).click();
    await confirm.getByText('Tick the box to confirm, or close this window.').waitFor();
    await screenshot(buyerPage, 'order-buyer-confirm-1280');
    await confirm.getByText('and it is as described.').click();
    await confirm.getByRole('button', { name: 'Release the money' }).click();
    await buyerPage.getByText('Thank you. The money is released to the seller.').waitFor();
    await buyerPage.getByText('Paid out to the seller').first().waitFor();
    await bothWidths(buyerPage, 'order-buyer');

    // The payout is on the seller's balances page.
    await sellerPage.goto(`${appUrl}/my/balances`);
    const paidOut = sellerPage.locator('.balances-page__figure', { hasText: 'Paid out' });
    await expect.poll(() => paidOut.innerText()).toContain('£253.00');
    await bothWidths(sellerPage, 'balances');

    // Every e-mail of the journey reached the local inbox.
    await waitForMail(buyer.email, 'Paid:');
    await waitForMail(seller.email, 'Sold, and paid for:');
    expect((await waitForMail(buyer.email, 'On its way:')).text).toContain('club van on Saturday');
    await waitForMail(seller.email, 'Receipt confirmed:');
    expect((await waitForMail(seller.email, 'Payout sent:')).text).toContain('£253.00');
  });

  it('lists problems for moderators, oldest first, with the reason and a way to settle', async () => {
    const ds = app.ctx.dataSource;
    const buyer = await buildUser(ds, { displayName: 'Tobias Trackpin' });
    const seller = await buildUser(ds, { displayName: 'Kingsmere Sidings Group' });
    const order = await buildOrder(ds, buyer, seller, { state: 'sent', itemMinor: 18_500 });
    await raiseProblem(
      app.ctx,
      { id: buyer.id, role: 'member', ip: '127.0.0.1' },
      order.id,
      'The cork underlay has lifted along one end board.',
    );
    const moderator = await buildUser(ds, { role: 'moderator' });
    const page = await browserFor(moderator.email);
    await page.goto(`${appUrl}/review/problems`);
    const item = page.locator('article', { hasText: `Order ${order.id}` });
    await item.getByText('The cork underlay has lifted along one end board.').waitFor();
    await item.getByText(`Settle order ${order.id}`).click();
    // Element Plus draws its own radio over a hidden input: choose by the visible label, as a person would.
    await item.getByText('Part refund, the rest to the seller').click();
    await item.getByLabel('Refund to the buyer (£)').fill('40');
    // 18 500 p, £40 back: kept 14 500 p, commission 8 % = 1 160 p, payout 13 340 p (shared/orders/money.ts).
    await item.getByText('£40.00 goes back to the buyer’s card; the seller receives £133.40.').waitFor();
    await item.scrollIntoViewIfNeeded();
    await bothWidths(page, 'problems');
  });
});

describe('rates, lists and the seller’s preview', () => {
  it('shows the rates as percentages, the orders on two tabs, and the payout under the price while listing', async () => {
    const ds = app.ctx.dataSource;
    const admin = await buildUser(ds, { role: 'admin' });
    const adminPage = await browserFor(admin.email);
    await adminPage.goto(`${appUrl}/admin/fees`);
    await expect.poll(() => adminPage.getByLabel('Commission (%)').inputValue()).toBe('8.00');
    await adminPage.getByLabel('Commission (%)').fill('31');
    await adminPage.getByLabel('Commission (%)').blur();
    await adminPage.getByText('The commission must be at most 3000 basis points (30 %).').waitFor();
    await adminPage.getByLabel('Commission (%)').fill('8.00');
    // 20 000 + 3 000 p at 800 bp: commission 1 840 p, payout 21 160 p (shared/orders/money.ts).
    await adminPage.getByText('Benchwright keeps £18.40 and the seller receives £211.60.', { exact: false }).waitFor();
    await bothWidths(adminPage, 'fees');

    const seller = await buildUser(ds, { displayName: 'Harrowgate Yard Modellers' });
    await buildOrder(ds, await buildUser(ds, { displayName: 'Olwen Baseplate' }), seller, { state: 'received' });
    const sellerPage = await browserFor(seller.email);
    await sellerPage.goto(`${appUrl}/orders?side=selling`);
    await sellerPage.getByText('to Olwen Baseplate', { exact: false }).waitFor();
    await bothWidths(sellerPage, 'orders-sold');

    await sellerPage.goto(`${appUrl}/sell`);
    await sellerPage.getByLabel('Price', { exact: true }).fill('240');
    // 24 000 p at 800 bp: 1 920 p kept, 22 080 p to the seller (shared/orders/money.ts shareOf).
    await sellerPage.getByText('Benchwright keeps 8.00 % (£19.20); you receive £220.80.').waitFor();
  });
});
