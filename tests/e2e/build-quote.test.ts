import { randomBytes } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import type { Page } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { Listing } from '../../server/features/listings/listing.entity';
import { SavedPlan } from '../../server/features/plans/saved-plan.entity';
import { gazetteer } from '../../server/features/towns/gazetteer';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { buildListing, serviceBody } from '../support/listing-factories';
import { testConfig } from '../support/test-env';

const appUrl = inject('appUrl');
let dataSource: DataSource;
let buyerSession: BrowserSession;
let builderSession: BrowserSession;

beforeAll(async () => {
  dataSource = createDataSource(testConfig().db);
  await dataSource.initialize();
  buyerSession = await openBrowser({ width: 1280, height: 900 });
  builderSession = await openBrowser({ width: 1280, height: 900 });
});
afterAll(async () => {
  await buyerSession?.close();
  await builderSession?.close();
  await dataSource?.destroy();
});

const townId = async (name: string) => (await gazetteer()).search(name, 20, 'GB').find((t) => t.name === name)!.id;

/** A builder with a listed build service (arranged directly: moderation is tested elsewhere). */
async function listedBuilder(name: string, town: string, serviceAreaKm: number) {
  const user = await buildUser(dataSource, { role: 'builder', displayName: name });
  const listing = await buildListing(dataSource, user, serviceBody({ townId: await townId(town), serviceAreaKm }));
  await dataSource.getRepository(Listing).update(listing.id, { state: 'listed', publishedAt: new Date() });
  return { user, listing };
}

/** A full-page screenshot at desktop and phone width, from the top. */
async function shoot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, `${name}-1280`);
  await page.setViewportSize({ width: 375, height: 740 });
  await screenshot(page, `${name}-375`);
  await page.setViewportSize({ width: 1280, height: 900 });
}

const stateShown = (page: Page, words: string) => page.locator('.build-order-page__state').getByText(words).waitFor();

describe('a build-service quote in the browser', () => {
  it('asks two builders from a saved plan, accepts the one that answers, pays the deposit, then the balance', async () => {
    const buyer = await buildUser(dataSource, { displayName: 'Morag Sinclair' });
    const plan = await dataSource.getRepository(SavedPlan).save({
      ownerId: buyer.id,
      name: 'Harbour branch module',
      input: { boards: [{ id: 'm', name: 'Module', lengthMm: 1200, widthMm: 600 }] },
      shareToken: null,
    });
    // Names unique to this run: builders from earlier runs still work round Thurso.
    const run = randomBytes(3).toString('hex');
    const nearName = `Pentland Frameworks ${run}`;
    const secondName = `Ness Benchwork ${run}`;
    const near = await listedBuilder(nearName, 'Wick', 80);
    const second = await listedBuilder(secondName, 'Inverness', 250);
    const { page } = buyerSession;
    const builderPage = builderSession.page;

    // The buyer opens the saved plan and asks builders from it.
    await signInThroughPage(page, appUrl, buyer.email, GOOD_PASSWORD);
    await page.goto(`${appUrl}/planner/${plan.id}`);
    await page.getByRole('link', { name: 'Ask builders for a quote' }).click();
    await page.getByRole('heading', { level: 1, name: 'Ask builders for a quote' }).waitFor();
    await expect.poll(() => page.getByLabel('Saved plan').inputValue()).toBe(String(plan.id));
    await page.getByLabel('Where the boards are for').fill('Thurso');
    await page
      .getByRole('option', { name: /^Thurso/ })
      .first()
      .click();
    await page.getByRole('checkbox', { name: new RegExp(nearName) }).check();
    await page.getByRole('checkbox', { name: new RegExp(secondName) }).check();
    await page.getByLabel('Notes for the builders').fill('Painted frames please; collection is fine too.');
    await shoot(page, 'build-quote-ask');
    await page.getByRole('button', { name: 'Send the request' }).click();
    await page.getByRole('heading', { level: 1, name: 'Quotes for “Harbour branch module”' }).waitFor();
    await page.getByText('No quotes yet').waitFor();

    // The nearer builder answers: the rate card's prices, the materials priced by hand with a note.
    await signInThroughPage(builderPage, appUrl, near.user.email, GOOD_PASSWORD);
    await builderPage.goto(`${appUrl}/quotes`);
    await builderPage.getByRole('heading', { name: 'Requests to you' }).waitFor();
    await shoot(builderPage, 'build-quote-inbox');
    await builderPage.getByRole('link', { name: 'Harbour branch module' }).click();
    await builderPage.getByRole('heading', { level: 1, name: 'Quote for “Harbour branch module”' }).waitFor();
    await expect.poll(() => builderPage.getByLabel('Line 1', { exact: true }).inputValue()).toBe('Frame timber');
    await expect.poll(() => builderPage.getByLabel('Amount (£)').first().inputValue()).toBe('378.99');
    await builderPage.getByLabel('Amount (£)').nth(3).fill('95');
    await builderPage.getByRole('button', { name: 'Send the quote' }).click();
    await builderPage
      .getByText('Some answers need changing')
      .or(builderPage.getByText(/Say what you changed/))
      .first()
      .waitFor();
    await builderPage
      .getByLabel('Note to the buyer')
      .fill('Materials at my merchant’s prices: birch ply and planed 2x1.');
    await shoot(builderPage, 'build-quote-editor');
    await builderPage.getByRole('button', { name: 'Send the quote' }).click();
    await builderPage.getByRole('heading', { name: /Your quote/ }).waitFor();

    // The buyer compares (one quote in, one builder still to answer) and accepts with delivery.
    await page.reload();
    await page.getByRole('region', { name: 'Quotes side by side' }).waitFor();
    await page.getByText('Materials at my merchant’s prices').waitFor();
    await expect(page.getByText(`${secondName}, `, { exact: false }).count()).resolves.toBeGreaterThan(0);
    await shoot(page, 'build-quote-compare');
    const [pdf] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('button', { name: `${nearName}: quote as PDF` }).click(),
    ]);
    expect((await readFile((await pdf.path())!)).subarray(0, 5).toString()).toBe('%PDF-');
    await page.getByRole('button', { name: `Accept ${nearName}` }).click();
    await page.getByLabel('Delivery address').fill('Morag Sinclair\n4 Harbour Road\nThurso\nKW14 7AA');
    await page.getByRole('button', { name: 'Accept and pay the deposit' }).click();
    await page.getByRole('heading', { level: 1, name: 'Build of “Harbour branch module”' }).waitFor();
    await stateShown(page, 'Waiting for the deposit');
    await shoot(page, 'build-quote-deposit');
    await page.getByRole('button', { name: /^Pay £/ }).click();
    await stateShown(page, 'Being built');
    const orderUrl = page.url();

    // The builder records the stages and marks the boards built.
    await builderPage.goto(orderUrl);
    await builderPage.getByRole('heading', { name: 'Build stages' }).waitFor();
    await builderPage.getByLabel('Note for the buyer (optional)').fill('Ply and timber in the workshop.');
    await builderPage.getByRole('button', { name: 'Record: Materials bought' }).click();
    await builderPage.getByText('Ply and timber in the workshop.').waitFor();
    await builderPage.getByRole('button', { name: 'Record: Frames built' }).click();
    await builderPage.getByText('Frames built', { exact: true }).waitFor();
    await builderPage.getByRole('button', { name: 'Built: ask for the balance' }).click();
    await stateShown(builderPage, 'Built: waiting for the balance');
    await shoot(builderPage, 'build-quote-stages');

    // The buyer pays the balance: the money is held until hand-over.
    await page.reload();
    await stateShown(page, 'Built: waiting for the balance');
    await page.getByText('the balance is due before hand-over').waitFor();
    await page.getByRole('button', { name: /^Pay £/ }).click();
    await stateShown(page, 'Paid: money held by Benchwright');
    await shoot(page, 'build-quote-paid');
    expect(second.listing.id).toBeGreaterThan(0);
  });
});
