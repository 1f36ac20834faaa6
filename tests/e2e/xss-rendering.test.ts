import { randomBytes } from 'node:crypto';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { sellerMove } from '../../server/features/listings/listings.service';
import type { User } from '../../server/features/users/user.entity';
import { tenByThirteenTwoLevel } from '../../shared/planner';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { addPhoto, buildListedListing, buildListing, TOWNS } from '../support/listing-factories';
import { signedInAs } from '../support/sessions';
import { startTestApp } from '../support/test-app';

/**
 * Text people type is stored as they typed it and shown as text, never as markup (OWASP XSS Prevention Cheat
 * Sheet, rule 1: encode for the HTML body). Every text field that other people see carries the classic payloads;
 * each page that shows them is opened in Chromium and must run none of them, hold none of their elements, and show
 * them as plain text. The app's CSP would stop inline handlers anyway, so the DOM is checked too.
 */
const IMG = '<img src=x onerror=window.__xss=1>';
const SCRIPT = '<script>window.__xss=1</script>';
const SVG = '"><svg onload=window.__xss=1>';
const LINK = '[x](javascript:window.__xss=1)';

const appUrl = inject('appUrl');
let app: AppInstance;
let browser: BrowserSession;
const token = `xq${randomBytes(4).toString('hex')}`;
let seller: User;
let buyer: User;
let moderator: User;
let listedId: number;
let queuedTitle: string;
let builderProfileId: number | undefined;

const listedTitle = `Station ${token} ${IMG}`;

beforeAll(async () => {
  app = await startTestApp();
  browser = await openBrowser();
  seller = await buildUser(app.ctx.dataSource, { displayName: `Sid ${SVG}` });
  buyer = await buildUser(app.ctx.dataSource, { displayName: `Bo ${IMG}` });
  moderator = await buildUser(app.ctx.dataSource, { role: 'moderator', displayName: 'Mo Checker' });
  const description = `Sturdy boards. ${IMG} ${SCRIPT} ${SVG} and a link ${LINK} in the text.`;
  const listed = await buildListedListing(app.ctx, seller, moderator, { title: listedTitle, description });
  listedId = listed.id;

  queuedTitle = `Queued ${token} ${SCRIPT}`;
  const queued = await buildListing(app.ctx.dataSource, seller, { title: queuedTitle, description });
  await addPhoto(app.ctx, queued, seller);
  await sellerMove(app.ctx, { id: seller.id, role: seller.role, ip: '127.0.0.1' }, queued.id, 'submit');

  const member = await signedInAs(app, buyer);
  await member.put(`/api/shortlist/${listedId}`).expect((res) => expect(res.status).toBeLessThan(300));
  await member
    .post('/api/saved-searches')
    .send({ name: `Yards ${LINK}`, query: { q: token } })
    .expect(201);
  await member
    .post('/api/plans')
    .send({ name: `Loft ${SCRIPT}`, input: tenByThirteenTwoLevel })
    .expect(201);
  const builder = await signedInAs(app, seller);
  const applied = await builder
    .post('/api/builder-profiles')
    .send({
      businessName: `Works ${token} ${SVG}`,
      about: `We build benchwork. ${IMG} ${SCRIPT} ${LINK}`,
      townId: TOWNS.crewe,
      builds: ['portable-modules'],
    })
    .expect(201);
  builderProfileId = applied.body.profile.id as number;
}, 60_000);
afterAll(async () => {
  await browser?.close();
  // Decided, so the review desk's list of waiting applications does not grow with every run.
  if (builderProfileId) {
    const desk = await signedInAs(app, moderator);
    await desk.post(`/api/builder-profiles/${builderProfileId}/decline`).send({ reason: 'Test application.' });
  }
  await app?.close();
});

/** What the page holds that a payload would have made, read in the page (string expression: no DOM types here). */
const PROBE = `(() => ({
  ran: typeof window.__xss,
  imgs: document.querySelectorAll('img[src="x"], img[onerror]').length,
  svgs: document.querySelectorAll('svg[onload]').length,
  scripts: [...document.scripts].filter((s) => s.textContent.includes('__xss')).length,
  handlers: [...document.querySelectorAll('*')].filter((e) => [...e.attributes].some((a) => /^on/i.test(a.name))).length,
  jsLinks: document.querySelectorAll('[href^="javascript:" i], [src^="javascript:" i]').length,
  text: document.body.innerText,
}))()`;

interface Probe {
  ran: string;
  imgs: number;
  svgs: number;
  scripts: number;
  handlers: number;
  jsLinks: number;
  text: string;
}

async function expectInert(page: Page, shows: string[], shot: string): Promise<void> {
  await page.getByText(/Loading/).waitFor({ state: 'detached' });
  await page.waitForLoadState('networkidle');
  const found = await page.evaluate<Probe>(PROBE);
  expect({ ...found, text: undefined }).toEqual({
    ran: 'undefined',
    imgs: 0,
    svgs: 0,
    scripts: 0,
    handlers: 0,
    jsLinks: 0,
    text: undefined,
  });
  for (const text of shows) expect(found.text.replace(/\s+/g, ' ')).toContain(text);
  await screenshot(page, `xss-${shot}`);
}

describe('text with markup in it, in Chromium', () => {
  it('shows as text on the search page and the listing page', async () => {
    const { page } = browser;
    await page.goto(`${appUrl}/modules?q=${token}`);
    await page.getByRole('main').getByText(listedTitle).first().waitFor();
    await expectInert(page, [listedTitle], 'search');

    await page.goto(`${appUrl}/modules/${listedId}`);
    await page.getByRole('heading', { level: 1, name: listedTitle }).waitFor();
    await expectInert(page, [listedTitle, IMG, SCRIPT, SVG, LINK, `Sid ${SVG}`], 'listing');
  });

  it('shows as text on the buyer’s shortlist, plans and account page', async () => {
    const { page } = browser;
    await page.context().clearCookies();
    await signInThroughPage(page, appUrl, buyer.email, GOOD_PASSWORD);
    await page.goto(`${appUrl}/my/shortlist`);
    await page.getByRole('main').getByText(listedTitle).first().waitFor();
    await expectInert(page, [listedTitle, `Yards ${LINK}`], 'shortlist');

    await page.goto(`${appUrl}/plans`);
    await page.getByRole('main').getByText(`Loft ${SCRIPT}`).first().waitFor();
    await expectInert(page, [`Loft ${SCRIPT}`], 'plans');

    await page.goto(`${appUrl}/account`);
    await page.getByRole('main').getByText(`Bo ${IMG}`).first().waitFor();
    await expectInert(page, [`Bo ${IMG}`], 'account');
  });

  it('shows as text on the review desk, for listings and builder applications', async () => {
    const { page } = browser;
    await page.context().clearCookies();
    await signInThroughPage(page, appUrl, moderator.email, GOOD_PASSWORD);
    await page.goto(`${appUrl}/review?pageSize=50`);
    const count = await page.getByText(/listings? waiting$/).innerText();
    const last = Math.max(1, Math.ceil(Number(count.replace(/\D/g, '')) / 50));
    if (last > 1) await page.goto(`${appUrl}/review?pageSize=50&page=${last}`);
    await page.getByRole('main').getByText(queuedTitle).first().waitFor();
    await expectInert(page, [queuedTitle], 'review-listings');

    await page.goto(`${appUrl}/review?tab=builders`);
    await page.getByRole('main').getByText(`Works ${token} ${SVG}`).waitFor();
    await expectInert(
      page,
      [`Works ${token} ${SVG}`, `We build benchwork. ${IMG} ${SCRIPT} ${LINK}`],
      'review-builders',
    );
  });
});
