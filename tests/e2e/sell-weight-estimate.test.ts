import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { estimateModuleWeight, estimateToKg } from '../../shared/planner/estimate-module-weight';
import { moduleListingSchema } from '../../shared/schemas/listing-module';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { buildListedListing, moduleBody } from '../support/listing-factories';
import { startTestApp } from '../support/test-app';

const appUrl = inject('appUrl');
let app: AppInstance;
let desktop: BrowserSession;
let phone: BrowserSession;

beforeAll(async () => {
  app = await startTestApp();
  desktop = await openBrowser({ width: 1280, height: 900 });
  phone = await openBrowser({ width: 375, height: 740 });
});
afterAll(async () => {
  await desktop?.close();
  await phone?.close();
  await app?.close();
});

/** Step 2 of the sell form: a 1200 × 450 mm board, 44 × 18 frame at 400 mm, 9 mm birch top, on legs. */
async function describeConstruction(page: Page): Promise<void> {
  const field = (label: string) => page.getByLabel(label, { exact: true });
  await field('Length').fill('1200');
  await field('Width').fill('450');
  await field('Height').fill('100');
  await field('Frame timber depth').fill('44');
  await field('Frame timber thickness').fill('18');
  await field('Cross-member spacing').fill('400');
  await field('Top').selectOption('birch-plywood');
  await field('Top thickness').fill('9');
  await field('Legs').check();
  for (const end of ['a', 'b']) {
    await page.locator(`#sell-end-${end}`).getByLabel('Rail-top height', { exact: true }).fill('1050');
  }
}

/** The body's estimate as the weight box takes it. */
function estimatedKg(body = moduleBody()): number {
  const estimate = estimateModuleWeight(moduleListingSchema.parse(body));
  if (!estimate.ok) throw new Error(estimate.reason);
  return estimateToKg(estimate.boardG);
}

describe('the weight estimated from the construction', () => {
  it('fills the weight box from the estimate on the sell form, at desktop and phone widths', async () => {
    const seller = await buildUser(app.ctx.dataSource, { displayName: 'Hattie Dowel' });
    // The same board as moduleBody (1200 × 450, legs to a 1050 mm rail top), worked out by the planner.
    const kg = estimatedKg();

    for (const [session, name] of [
      [desktop, 'sell-weight-estimate-desktop'],
      [phone, 'sell-weight-estimate-phone'],
    ] as const) {
      const { page } = session;
      await signInThroughPage(page, appUrl, seller.email, GOOD_PASSWORD);
      await page.goto(`${appUrl}/sell`);
      await describeConstruction(page);
      await page.getByRole('button', { name: 'Estimate from construction' }).click();
      await page.getByText(`Estimated ${kg} kg for one board`).waitFor();
      await page.getByRole('button', { name: `Use ${kg} kg as the weight` }).click();

      expect(await page.getByLabel('Weight of the heaviest board', { exact: true }).inputValue()).toBe(String(kg));
      await page.getByText('The weight above is this estimate').waitFor();
      await page.locator('#sell-price').scrollIntoViewIfNeeded();
      await screenshot(page, name);
    }
  });

  it('tells a buyer on the listing page that the weight was estimated', async () => {
    const seller = await buildUser(app.ctx.dataSource, { displayName: 'Hattie Dowel' });
    const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
    const listing = await buildListedListing(app.ctx, seller, moderator, {
      title: 'OO through station, weight from the planner',
      weightKg: estimatedKg(),
      weightSource: 'estimated',
    });

    const { page } = desktop;
    await page.goto(`${appUrl}/modules/${listing.id}`);
    const handling = page.getByRole('region', { name: 'Lifting it and getting it home' });
    await handling.waitFor();
    expect(await handling.innerText()).toContain('estimated from the construction, not weighed');
    await screenshot(page, 'listing-estimated-weight');
  });
});
