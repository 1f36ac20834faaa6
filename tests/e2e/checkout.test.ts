import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { currentFeeRates } from '../../server/features/orders/fee-rates';
import { Order } from '../../server/features/orders/order.entity';
import { orderAmounts } from '../../shared/orders/money';
import { openBrowser, screenshot, type BrowserSession } from '../support/browser';
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

describe.each([
  ['desktop', { width: 1280, height: 900 }],
  ['phone', { width: 375, height: 740 }],
])('buying a module on a %s', (name, viewport) => {
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await openBrowser(viewport);
  });
  afterAll(() => browser?.close());

  it('signs in from the listing, shows the total first, says a declined card was declined, then pays', async () => {
    const ds = app.ctx.dataSource;
    const seller = await buildUser(ds, { displayName: 'Thornholme Model Railway Club' });
    const moderator = await buildUser(ds, { role: 'moderator' });
    const title = `EM fiddle yard module, five roads (${name})`;
    const listing = await buildListedListing(app.ctx, seller, moderator, { ...EVERY_WAY, title });
    const buyer = await buildUser(ds, { displayName: 'Priya Fishplate' });
    const { page } = browser;
    // Totals by shared/orders/money.ts orderAmounts with the rates that apply now (an administrator may change them).
    const rates = await currentFeeRates(ds.manager);
    const pounds = (minor: number) =>
      new Intl.NumberFormat('en-GB', { style: 'currency', currency: 'GBP' }).format(minor / 100);
    const collected = pounds(orderAmounts(18_000, 0, rates).totalMinor);
    const byParcel = orderAmounts(18_000, 1_800, rates).totalMinor;

    // A visitor is sent to sign in and comes straight back to buying.
    await page.goto(`${appUrl}/modules/${listing.id}`);
    const buy = page.getByRole('link', { name: 'Buy this module' });
    await buy.waitFor().catch(async (error: unknown) => {
      await screenshot(page, `checkout-listing-failed-${name}`);
      throw error;
    });
    await page.waitForLoadState('networkidle');
    await screenshot(page, `checkout-listing-${name}`);
    await buy.click();
    await page.getByLabel('E-mail address', { exact: true }).fill(buyer.email);
    await page.getByLabel('Password', { exact: true }).fill(GOOD_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`${appUrl}/modules/${listing.id}/buy`);

    // The whole total is on screen before the first question, and follows the choice.
    const total = page.getByTestId('checkout-total');
    await expect.poll(() => total.innerText()).toBe(collected);
    const firstChoice = page.getByRole('radio', { name: /Collect it from the seller/ });
    const totalBox = (await total.boundingBox())!;
    const choiceBox = (await firstChoice.boundingBox())!;
    if (name === 'phone') expect(totalBox.y).toBeLessThan(choiceBox.y);
    await page.getByRole('radio', { name: /Parcel courier/ }).check();
    await expect.poll(() => total.innerText()).toBe(pounds(byParcel));
    await page.getByLabel('Delivery address', { exact: true }).fill('Priya Fishplate\n4 Chair Row\nNantwich\nCW5 6BB');
    await screenshot(page, `checkout-choose-${name}`);
    await page.getByRole('button', { name: 'Reserve it and go to payment' }).click();

    await page.getByRole('radio', { name: /Card that is declined/ }).check();
    await page.getByRole('button', { name: `Pay ${pounds(byParcel)}` }).click();
    await page.getByText('Your card was declined. Nothing was taken. Try another card.').waitFor();
    await screenshot(page, `checkout-declined-${name}`);

    await page.getByRole('radio', { name: /Card that pays/ }).check();
    await page.getByRole('button', { name: `Pay ${pounds(byParcel)}` }).click();
    // On to the order page once the provider's confirmation has moved the order.
    await page.waitForURL(/\/orders\/\d+$/, { timeout: 30_000 });
    await page.waitForLoadState('networkidle');
    await screenshot(page, `checkout-paid-${name}`);
    const order = await ds.getRepository(Order).findOneByOrFail({ listingId: listing.id });
    expect(order).toMatchObject({ state: 'paid_held', handover: 'parcel', totalMinor: byParcel, buyerId: buyer.id });
  });
});
