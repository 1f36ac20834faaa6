import { randomBytes } from 'node:crypto';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import path from 'node:path';
import { ARTIFACTS, openBrowser, screenshot, type BrowserSession, signInThroughPage } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { testConfig } from '../support/test-env';

const appUrl = inject('appUrl');
let dataSource: DataSource;
let desktop: BrowserSession;
let phone: BrowserSession;

beforeAll(async () => {
  dataSource = createDataSource(testConfig().db);
  await dataSource.initialize();
  desktop = await openBrowser({ width: 1280, height: 900 });
  phone = await openBrowser({ width: 375, height: 740 });
});
afterAll(async () => {
  await desktop?.close();
  await phone?.close();
  await dataSource?.destroy();
});

/** A small JPEG drawn here: a board's frame from above with a rule laid along it, in the given timber shade. */
function boardPhoto(shade: string): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="800" height="600">
    <rect width="800" height="600" fill="#efe8dc"/>
    <rect x="100" y="180" width="600" height="240" fill="#e9d9bd" stroke="${shade}" stroke-width="18"/>
    <path d="M250 190v220M400 190v220M550 190v220" stroke="${shade}" stroke-width="12"/>
    <rect x="100" y="470" width="600" height="30" fill="#f2c94c" stroke="#333"/>
    ${Array.from({ length: 13 }, (_, i) => `<path d="M${100 + i * 50} 470v14" stroke="#333" stroke-width="2"/>`).join('')}
  </svg>`;
  return sharp(Buffer.from(svg)).jpeg({ quality: 80 }).toBuffer();
}

const signIn = (page: Page, email: string) => signInThroughPage(page, appUrl, email, GOOD_PASSWORD);

/** Screenshot once the page's pictures have arrived. */
async function settledShot(page: Page, name: string): Promise<void> {
  await page.waitForLoadState('networkidle');
  await screenshot(page, name);
}

/** Sign out through the account menu of the wide header. */
async function signOut(page: Page): Promise<void> {
  const nav = page.getByRole('navigation', { name: 'Main' });
  await nav.getByRole('button', { name: /^Signed in as/ }).click();
  await nav.getByRole('button', { name: 'Sign out' }).click();
  await nav.getByRole('link', { name: 'Sign in' }).waitFor();
}

/** Open the review desk on the page that holds the newest listings (the queue runs oldest first). */
async function openNewestQueuePage(page: Page): Promise<void> {
  await page.goto(`${appUrl}/review?pageSize=50`);
  const count = await page.getByText(/listings? waiting$/).innerText();
  const last = Math.max(1, Math.ceil(Number(count.replace(/\D/g, '')) / 50));
  if (last > 1) await page.goto(`${appUrl}/review?pageSize=50&page=${last}`);
}

/** Fill the sell form's first five steps for a 30 kg OO module going by parcel courier. */
async function describeModule(page: Page, title: string): Promise<void> {
  const field = (label: string) => page.getByLabel(label, { exact: true });
  await field('Title').fill(title);
  await field('Description').fill(
    'One board of planed 44 × 18 mm timber with a 9 mm birch ply top, a through station with two platforms.',
  );
  await field('Scale and gauge').selectOption('oo');
  await field('Bolts (coach or carriage bolts with wing nuts)').check();
  await field('Length').fill('1200');
  await field('Width').fill('450');
  await field('Height').fill('100');
  await field('Frame timber depth').fill('44');
  await field('Frame timber thickness').fill('18');
  await field('Cross-member spacing').fill('400');
  await field('Top').selectOption('birch-plywood');
  await field('Top thickness').fill('9');
  await field('Legs').check();
  await field('The board is wired').check();
  await field('DCC (digital)').check();
  await field('Bus wire size').fill('1.5');
  for (const end of ['a', 'b']) {
    const fields = page.locator(`#sell-end-${end}`);
    await fields.getByLabel('Track 1', { exact: true }).fill('150');
    await fields.getByLabel('Rail-top height', { exact: true }).fill('1050');
  }
  await field('Wired and running').check();
  await field('Sound, signs of use').check();
  await field('Condition notes').fill('A little ballast loose by the points; the frame is square and true.');
  await field('Price').fill('180');
  await field('Nearest town').fill('Crewe');
  await page
    .getByRole('option', { name: /^Crewe/ })
    .first()
    .click();
  await field('Parcel courier').check();
  await field('Courier price the buyer pays').fill('24');
  await field('Weight of the heaviest board').fill('30');
}

describe('module listings in the browser', () => {
  // Letters only, so the full-text index takes it as one word: digits become g–p.
  const word = `Wibblecombe${randomBytes(4)
    .toString('hex')
    .replace(/\d/g, (d) => 'ghijklmnop'[Number(d)]!)}`;
  const title = `OO ${word} through station`;

  it('a member lists a module with two photos, a moderator approves it, and another member finds and opens it', async () => {
    const seller = await buildUser(dataSource, { displayName: 'Hattie Dowel' });
    const moderator = await buildUser(dataSource, { role: 'moderator', displayName: 'Morag Checklist' });
    const buyer = await buildUser(dataSource, { displayName: 'Ivor Fishplate' });
    const { page } = desktop;

    await signIn(page, seller.email);
    await page.goto(`${appUrl}/sell`);
    await describeModule(page, title);
    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.waitForURL(/\/modules\/\d+\/edit$/);
    await page.getByText('Draft saved.').waitFor();
    await page.locator('#photo-files').setInputFiles([
      { name: 'board-from-above.jpg', mimeType: 'image/jpeg', buffer: await boardPhoto('#b27a3e') },
      { name: 'board-with-rule.jpg', mimeType: 'image/jpeg', buffer: await boardPhoto('#7a4a17') },
    ]);
    await page.getByText('2 of 2').waitFor();
    await settledShot(page, 'listing-sell-form-desktop');
    await page.getByRole('button', { name: 'Send for review' }).click();
    await page.getByText('Sent for review.').waitFor();
    await page.goto(`${appUrl}/my/listings`);
    await page.getByRole('link', { name: title, exact: true }).waitFor();
    await settledShot(page, 'listing-my-listings-desktop');
    await signOut(page);

    await signIn(page, moderator.email);
    await openNewestQueuePage(page);
    const item = page.locator('article').filter({ has: page.getByRole('heading', { name: title }) });
    await item.getByRole('checkbox').first().waitFor();
    for (const check of await item.getByRole('checkbox').all()) await check.check();
    await item.screenshot({ path: path.join(ARTIFACTS, 'listing-review-item-desktop.png') });
    await item.getByRole('button', { name: /^Approve/ }).click();
    await page.getByText(`“${title}” is now listed.`).first().waitFor();
    await signOut(page);

    await signIn(page, buyer.email);
    await page.goto(`${appUrl}/modules`);
    await page.getByLabel('Search words').fill(word);
    await page.getByRole('button', { name: 'Search', exact: true }).click();
    await page.getByRole('checkbox', { name: /^OO \(1:76\.2/ }).check();
    await page.waitForURL(/scale=oo/);
    await expect.poll(() => page.getByRole('status').filter({ hasText: 'result' }).innerText()).toBe('1 result');
    await page.getByRole('button', { name: 'Remove filter: Scale OO' }).waitFor();
    await settledShot(page, 'listing-search-desktop');
    await page.getByRole('link', { name: title, exact: true }).click();
    const handling = page.getByRole('region', { name: 'Lifting it and getting it home' });
    await handling.getByText('A two-person lift').waitFor();
    expect(await handling.innerText()).toMatch(/Follow your local rules/);
    await settledShot(page, 'listing-page-desktop');
    const searchUrl = `${appUrl}/modules?q=${word}&scale=oo`;
    const listingUrl = page.url();
    await signOut(page);

    await phone.page.goto(searchUrl);
    await phone.page.getByRole('link', { name: title, exact: true }).waitFor();
    await settledShot(phone.page, 'listing-search-phone');
    await phone.page.goto(listingUrl);
    await phone.page.getByText('A two-person lift').waitFor();
    await settledShot(phone.page, 'listing-page-phone');
    await signIn(phone.page, seller.email);
    await phone.page.goto(`${appUrl}/my/listings`);
    await phone.page.getByRole('listitem').getByText('On show to buyers').waitFor();
    await settledShot(phone.page, 'listing-my-listings-phone');
  });
});
