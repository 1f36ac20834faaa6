import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { Order } from '../../server/features/orders/order.entity';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { linkIn, waitForMail } from '../support/inbox';
import { buildListedListing } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

const appUrl = inject('appUrl');
let app: AppInstance;
let buyerBrowser: BrowserSession;
let sellerBrowser: BrowserSession;

beforeAll(async () => {
  app = await startTestApp();
  buyerBrowser = await openBrowser({ width: 1280, height: 900 });
  sellerBrowser = await openBrowser({ width: 375, height: 740 });
});
afterAll(async () => {
  await buyerBrowser?.close();
  await sellerBrowser?.close();
  await app?.close();
});

/** Markup a member might type; it must show as the characters typed and never run. */
const XSS = '<img src=x onerror="window.__pwned=1"><script>window.__pwned=2</script>';

/** WCAG 2.2 AA problems axe-core finds on the page, one line each. */
async function violations(page: Page): Promise<string[]> {
  const result = await new AxeBuilder({ page })
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'])
    .analyze();
  return result.violations.map((v) => `${v.impact}: ${v.id} — ${v.help} (${v.nodes.length})`);
}

const messageBox = (page: Page) => page.getByLabel('Your message', { exact: true });
const messageList = (page: Page) => page.getByRole('list', { name: 'Messages' });

describe('a question about a listing, end to end', () => {
  it('reaches the seller by e-mail and badge, and the reply reaches the buyer; typed markup stays text', async () => {
    const seller = await buildUser(app.ctx.dataSource, { displayName: 'Morwenna Sleeper' });
    const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
    const title = `Branch terminus with goods yard ${Date.now()}`;
    const listing = await buildListedListing(app.ctx, seller, moderator, { title });
    const buyerUser = await buildUser(app.ctx.dataSource, { displayName: 'Cedric Fishplate' });
    const buyer = buyerBrowser.page;
    const question = `Does it come with the fiddle-yard cassettes?\nAnd: ${XSS}`;

    // The buyer asks from the listing page.
    await signInThroughPage(buyer, appUrl, buyerUser.email, GOOD_PASSWORD);
    await buyer.goto(`${appUrl}/modules/${listing.id}`);
    await buyer.getByRole('heading', { name: title }).waitFor();
    await screenshot(buyer, 'conversations-listing-desktop');
    await buyer.getByRole('link', { name: 'Ask the seller a question' }).click();
    await buyer.waitForURL(`**/messages/listing/${listing.id}`);
    await buyer.getByText('Text only, up to 2,000 characters').waitFor();

    // Too long: refused next to the field, and the text is kept.
    await messageBox(buyer).fill('x'.repeat(2001));
    await buyer.getByRole('button', { name: 'Send message' }).click();
    await buyer
      .getByText(/at most 2,000 characters/)
      .first()
      .waitFor();
    expect(await messageBox(buyer).inputValue()).toHaveLength(2001);
    expect(await messageBox(buyer).getAttribute('aria-invalid')).toBe('true');

    await messageBox(buyer).fill(question);
    await messageBox(buyer).press('Control+Enter');
    await buyer.waitForURL(/\/messages\/\d+$/);
    const sent = messageList(buyer).getByText('Does it come with the fiddle-yard cassettes?');
    await sent.waitFor();
    expect(await sent.innerText()).toContain(XSS);
    expect(await messageBox(buyer).inputValue()).toBe('');
    expect(await buyer.evaluate(() => (globalThis as { __pwned?: number }).__pwned)).toBeUndefined();
    expect(await messageList(buyer).locator('img, script').count()).toBe(0);
    await screenshot(buyer, 'conversations-thread-desktop');
    expect(await violations(buyer)).toEqual([]);

    // The seller is e-mailed a link, not the text.
    const mail = await waitForMail(seller.email, `New message from Cedric Fishplate about ${title}`);
    expect(mail.text).not.toContain('cassettes');
    const link = linkIn(mail, new URL(buyer.url()).pathname);

    // The seller, on a phone, sees the badge, opens the link and replies.
    const phone = sellerBrowser.page;
    await signInThroughPage(phone, appUrl, seller.email, GOOD_PASSWORD);
    await phone.getByRole('link', { name: '1 unread message' }).waitFor();
    await screenshot(phone, 'conversations-badge-phone');
    await phone.goto(link.href);
    await messageList(phone).getByText('Does it come with the fiddle-yard cassettes?').waitFor();
    await phone.getByRole('link', { name: 'Messages, none unread' }).waitFor();
    await messageBox(phone).fill('Yes, all four cassettes.\nCollection from Truro is easiest.');
    await phone.getByRole('button', { name: 'Send message' }).click();
    await messageList(phone).getByText('Yes, all four cassettes.').waitFor();
    await screenshot(phone, 'conversations-thread-phone');

    // The buyer sees the reply counted in the header and in the list, then reads it.
    await buyer.goto(`${appUrl}/messages`);
    await buyer.getByRole('link', { name: '1 unread message' }).waitFor();
    await buyer.getByText('1 new').waitFor();
    await screenshot(buyer, 'conversations-list-desktop');
    expect(await violations(buyer)).toEqual([]);
    await buyer.getByRole('link', { name: title }).click();
    const reply = messageList(buyer).getByText('Yes, all four cassettes.');
    await reply.waitFor();
    expect(await reply.innerText()).toBe('Yes, all four cassettes.\nCollection from Truro is easiest.');
    await buyer.getByRole('link', { name: 'Messages, none unread' }).waitFor();

    await phone.goto(`${appUrl}/messages`);
    await phone.getByRole('link', { name: title }).waitFor();
    await screenshot(phone, 'conversations-list-phone');
  });

  it('sends a visitor to sign in and back to the question', async () => {
    const seller = await buildUser(app.ctx.dataSource);
    const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
    const listing = await buildListedListing(app.ctx, seller, moderator);
    const member = await buildUser(app.ctx.dataSource);
    const visitor = await openBrowser({ width: 375, height: 740 });
    try {
      const { page } = visitor;
      await page.goto(`${appUrl}/modules/${listing.id}`);
      const ask = page.getByRole('link', { name: 'Sign in to ask the seller a question' });
      await ask.waitFor();
      await screenshot(page, 'conversations-listing-phone');
      await ask.click();
      await page.getByLabel('E-mail address', { exact: true }).fill(member.email);
      await page.getByLabel('Password', { exact: true }).fill(GOOD_PASSWORD);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL(`**/messages/listing/${listing.id}`);
      await messageBox(page).waitFor();
      await screenshot(page, 'conversations-ask-phone');
    } finally {
      await visitor.close();
    }
  });

  it('shows moderators who shared contact details, and the conversation of an order with a problem', async () => {
    const seller = await buildUser(app.ctx.dataSource, { displayName: 'Agnes Baseboard' });
    const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
    const listing = await buildListedListing(app.ctx, seller, moderator, { title: `Viaduct module ${Date.now()}` });
    const buyer = await buildUser(app.ctx.dataSource, { displayName: 'Lionel Cant' });
    const repo = app.ctx.dataSource.getRepository(Order);
    const order = await repo.save(
      repo.create({
        ...{ kind: 'module', state: 'problem_raised', listingId: listing.id, buyerId: buyer.id, sellerId: seller.id },
        ...{ currency: 'GBP', handover: 'collection', itemMinor: 18_000, deliveryMinor: 0, buyerFeeMinor: 0 },
        ...{ totalMinor: 18_000, commissionBps: 0, buyerFeeBps: 0, commissionMinor: 0, payoutMinor: 18_000 },
        problemRaisedAt: new Date(),
      }),
    );
    const sent = await (
      await signedInAs(app, buyer)
    )
      .post(`/api/conversations/orders/${order.id}/messages`)
      .send({ body: 'The far end plate is cracked. Call me on 07700 900456 or write to lionel@example.test.' })
      .expect(201);
    const desk = await openBrowser({ width: 1280, height: 900 });
    const phone = await openBrowser({ width: 375, height: 740 });
    try {
      for (const [session, name] of [
        [desk, 'desktop'],
        [phone, 'phone'],
      ] as const) {
        await signInThroughPage(session.page, appUrl, moderator.email, GOOD_PASSWORD);
        await session.page.goto(`${appUrl}/review/messages`);
        await session.page.getByText('07700 900456').first().waitFor();
        await screenshot(session.page, `conversations-flagged-${name}`);
        expect(await violations(session.page)).toEqual([]);
      }
      await desk.page.getByRole('link', { name: 'Read the order’s conversation' }).first().click();
      await desk.page.waitForURL(`**/messages/${sent.body.conversationId}`);
      await desk.page.getByText(/Contact details shared: phone number “07700 900456”/).waitFor();
      expect(await desk.page.getByLabel('Your message').count()).toBe(0);
      await screenshot(desk.page, 'conversations-moderator-desktop');
    } finally {
      await desk.close();
      await phone.close();
    }
  });
});
