import { randomBytes } from 'node:crypto';
import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import { sellerMove } from '../../server/features/listings/listings.service';
import { sendBackListing } from '../../server/features/listings/moderation.service';
import type { User } from '../../server/features/users/user.entity';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { EVERY_WAY } from '../support/checkout-fixtures';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { addPhoto, buildListedListing, buildListing, publishListing } from '../support/listing-factories';
import { startTestApp } from '../support/test-app';

/** The lines of the screens checklist (UX.md) that only a browser can see; each test names its line numbers. */
const appUrl = inject('appUrl');
let app: AppInstance;
let seller: User;
let buyer: User;
let listingId: number;
let desktop: BrowserSession;
// Letters only, so the full-text index takes it as one word.
const word = `Quoddle${randomBytes(4)
  .toString('hex')
  .replace(/\d/g, (d) => 'ghijklmnop'[Number(d)]!)}`;

beforeAll(async () => {
  app = await startTestApp();
  const ds = app.ctx.dataSource;
  seller = await buildUser(ds, { displayName: 'Grisedale Light Railway Group' });
  buyer = await buildUser(ds, { displayName: 'Nell Trackpin' });
  const moderator = await buildUser(ds, { role: 'moderator' });
  const first = await buildListing(ds, seller, { ...EVERY_WAY, title: `${word} OO terminus`, finish: 'topped' });
  await addPhoto(app.ctx, first, seller);
  await publishListing(app.ctx, first, seller, moderator);
  listingId = first.id;
  const more = [
    { title: `${word} N fiddle yard`, scaleId: 'n', finish: 'topped', priceMinor: 9_000 },
    { title: `${word} OO bare frame`, scaleId: 'oo', finish: 'bare-frame', priceMinor: 30_000 },
  ] as const;
  for (const body of more) await buildListedListing(app.ctx, seller, moderator, body);
  desktop = await openBrowser();
  await signIn(desktop.page, seller);
}, 90_000);
afterAll(async () => {
  await desktop?.close();
  await app?.close();
});

const count = (page: Page) => page.getByRole('status').filter({ hasText: /result|Searching/ });
const countIs = (page: Page, text: string) => expect.poll(() => count(page).innerText()).toBe(text);
const signIn = (page: Page, user: User) => signInThroughPage(page, appUrl, user.email, GOOD_PASSWORD);

/**
 * Every rendered form control in <main> whose name does not come from label text a person can see: a placeholder,
 * an aria-label or a visually hidden (1 px) label is no visible label. Closed disclosures are not rendered.
 */
const UNLABELLED = `(() => {
  const seen = (el) => { const r = el.getBoundingClientRect(); return el.checkVisibility() && r.width > 1 && r.height > 1; };
  const text = (el) => el !== null && el.textContent.trim().length > 0 && seen(el);
  const shown = [...document.querySelectorAll('main input:not([type=hidden]), main select, main textarea')]
    .filter((el) => seen(el) || [...(el.labels ?? [])].some(seen));
  return { checked: shown.length, unlabelled: shown.filter((el) => ![...(el.labels ?? [])].some(text) &&
      !(el.getAttribute('aria-labelledby') ?? '').split(' ').some((id) => text(document.getElementById(id))))
    .map((el) => el.outerHTML.slice(0, 160)) }; })()`;

interface LabelCheck {
  checked: number;
  unlabelled: string[];
}

/** Check the labels of the page's rendered fields, and that there were fields to check. */
async function expectVisibleLabels(page: Page, path: string): Promise<void> {
  const found = await page.evaluate<LabelCheck>(UNLABELLED);
  expect(found.checked, path).toBeGreaterThan(0);
  expect(found.unlabelled, path).toEqual([]);
}

/** WCAG 2.2 contrast ratio of two CSS colours (WCAG 2.2, definitions of "contrast ratio" and "relative luminance"). */
const CONTRAST = `(() => {
  const rgb = (c) => { const x = document.createElement('i'); x.style.color = c; document.body.append(x);
    const v = getComputedStyle(x).color.match(/[\\d.]+/g).slice(0, 3).map(Number); x.remove(); return v; };
  const lum = (c) => { const [r, g, b] = rgb(c).map((v) => { v /= 255; return v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4; });
    return 0.2126 * r + 0.7152 * g + 0.0722 * b; };
  const ratio = (a, b) => { const [hi, lo] = [lum(a), lum(b)].sort((p, q) => q - p); return (hi + 0.05) / (lo + 0.05); };
  const v = (name) => getComputedStyle(document.documentElement).getPropertyValue(name).trim();
  const input = document.getElementById('search-words'); input.focus();
  return { focusOnCanvas: ratio(getComputedStyle(input).outlineColor, v('--bw-canvas')),
    borderOnSurface: ratio(v('--bw-border-strong'), v('--bw-surface')), borderOnCanvas: ratio(v('--bw-border-strong'), v('--bw-canvas')),
    primary: v('--el-color-primary').toLowerCase(), dark: document.documentElement.classList.contains('dark') }; })()`;

describe('the search page', () => {
  it('shows chips with a clear-all, ORs values within a filter and ANDs filters (lines 1, 2, 3, 5, 6)', async () => {
    const { page } = desktop;
    await page.goto(`${appUrl}/modules?q=${word}`);
    await countIs(page, '3 results');
    expect(await count(page).getAttribute('aria-live')).toBe('polite');
    expect(await page.getByLabel('Order').inputValue()).toBe('relevance');
    expect(await page.locator('#search-sort option').allInnerTexts()).toEqual(
      expect.arrayContaining([
        'Best match for the words',
        'Newest first',
        'Price, lowest first',
        'Price, highest first',
      ]),
    );
    const legends = await page.locator('aside legend').allInnerTexts();
    for (const fact of ['Scale', 'Length of a board', 'Width of a board', 'How finished', 'Price (£)', 'Distance'])
      expect(legends).toContain(fact);

    const oo = page.getByRole('checkbox', { name: /^OO \(1:76\.2/ });
    await oo.check();
    await countIs(page, '2 results');
    await page.getByRole('button', { name: 'Remove filter: Scale OO' }).waitFor();
    expect(await oo.isChecked()).toBe(true);
    await page.getByRole('checkbox', { name: /^N \(1:160/ }).check();
    await countIs(page, '3 results');
    await page.getByRole('checkbox', { name: 'Frame and top, ready for track' }).check();
    await countIs(page, '2 results');
    expect(new URL(page.url()).searchParams.get('scale')).toBe('oo,n');
    await screenshot(page, 'ux-search-chips-desktop');

    await page.getByRole('button', { name: 'Clear all filters' }).click();
    await countIs(page, '3 results');
    expect(await page.getByRole('button', { name: /^Remove filter/ }).count()).toBe(0);
    expect(await oo.isChecked()).toBe(false);
    expect(Object.fromEntries(new URL(page.url()).searchParams)).toEqual({ q: word });

    await page.goto(`${appUrl}/modules?q=${word}&scale=z`);
    await countIs(page, '0 results');
    await page.getByRole('button', { name: 'Remove Scale Z' }).click();
    await countIs(page, '3 results');
  });

  it('takes typed price bounds, has no slider, and explains a bound it cannot read (lines 4, 15)', async () => {
    const { page } = desktop;
    await page.goto(`${appUrl}/modules?q=${word}`);
    await countIs(page, '3 results');
    expect(await page.getByRole('slider').count()).toBe(0);
    const price = page.getByRole('group', { name: 'Price (£)' });
    await price.getByLabel('From').fill('100');
    await price.getByLabel('From').press('Enter');
    await countIs(page, '2 results');
    const to = price.getByLabel('To');
    await to.fill('plenty');
    await to.press('Enter');
    expect(await to.getAttribute('aria-invalid')).toBe('true');
    const error = page.locator(`#${(await to.getAttribute('aria-describedby'))!.split(' ').at(-1)}`);
    expect(await error.getAttribute('role')).toBe('alert');
    expect(await error.innerText()).not.toBe('');
  });

  it('keeps the scroll position, the order and the words when a filter changes, all in the address (line 7)', async () => {
    const { page } = desktop;
    await page.goto(`${appUrl}/modules?q=${word}`);
    await countIs(page, '3 results');
    await page.getByLabel('Order').selectOption('price-asc');
    await page.waitForURL(/sort=price-asc/);
    const dcc = page.getByRole('checkbox', { name: 'DCC', exact: true });
    await dcc.scrollIntoViewIfNeeded();
    const before = await page.evaluate<number>('window.scrollY');
    expect(before).toBeGreaterThan(100);
    await dcc.check();
    await page.waitForURL(/control=dcc/);
    await countIs(page, '3 results');
    expect(Math.abs((await page.evaluate<number>('window.scrollY')) - before)).toBeLessThanOrEqual(2);
    expect(await page.getByLabel('Order').inputValue()).toBe('price-asc');
    expect(await page.getByLabel('Search words').inputValue()).toBe(word);

    await page.reload();
    await countIs(page, '3 results');
    expect(await page.getByLabel('Order').inputValue()).toBe('price-asc');
    expect(await page.getByLabel('Search words').inputValue()).toBe(word);
    expect(await dcc.isChecked()).toBe(true);
    const titles = await page.locator('main article h3').allInnerTexts();
    expect(titles[0]).toBe(`${word} N fiddle yard`);
  });
});

describe('the listing page', () => {
  it('shows the ways home with their costs, British money, thumbnails and a remembered unit (lines 8, 9, 10, 25)', async () => {
    const { page } = desktop;
    await page.goto(`${appUrl}/modules/${listingId}`);
    const ways = page.getByRole('region', { name: 'Lifting it and getting it home' });
    await ways.waitFor();
    const text = await ways.innerText();
    expect(text).toMatch(/Collect it from near Crewe\s*No charge/);
    expect(text).toMatch(/The seller delivers within 40 km of Crewe\s*£25\.00/);
    expect(text).toMatch(/Parcel courier, charged on [\d.]+ kg\s*£18\.00/);
    expect(await page.locator('main').innerText()).toContain('£180.00');
    await page.getByRole('button', { name: 'Show photo 2 of 2' }).waitFor();
    await page.getByRole('button', { name: 'Enlarge' }).click();
    await page.getByRole('dialog').waitFor();
    await page.keyboard.press('Escape');

    await page.locator('.el-radio-button', { hasText: 'ft-in' }).first().click();
    await expect.poll(() => page.locator('main').innerText()).toMatch(/3' 11/);
    await page.goto(`${appUrl}/modules?q=${word}`);
    await countIs(page, '3 results');
    expect(await page.locator('main article').first().innerText()).toMatch(/\d' \d+[^×]*" ×/);
    await page.goto(`${appUrl}/modules/${listingId}`);
    await ways.waitFor();
    expect(await page.getByRole('radio', { name: 'ft-in' }).first().isChecked()).toBe(true);
    await page.locator('.el-radio-button', { hasText: 'mm' }).first().click();
  });
});

describe('forms', () => {
  it('labels every field visibly, checks a field on leaving it, clears the error when fixed, keeps input (lines 13–16)', async () => {
    const visitor = await openBrowser();
    try {
      for (const path of ['/sign-in', '/join', '/forgot-password', '/modules', '/planner']) {
        await visitor.page.goto(`${appUrl}${path}`);
        await visitor.page.locator('main h1').first().waitFor();
        await visitor.page.waitForLoadState('networkidle');
        await expectVisibleLabels(visitor.page, path);
      }
    } finally {
      await visitor.close();
    }
    const { page } = desktop;
    await page.goto(`${appUrl}/sell`);
    const length = page.getByLabel('Length', { exact: true });
    await length.waitFor();
    await expectVisibleLabels(page, '/sell');
    const hintIds = (await length.getAttribute('aria-describedby'))!.split(' ');
    expect(await page.locator(`#${hintIds[0]}`).innerText()).toMatch(/\d/);

    // The check itself finds a field named only by its placeholder.
    await page.evaluate(`document.querySelector('main').append(Object.assign(document.createElement('input'),
      { id: 'ux-placeholder-only', placeholder: 'Nearest town' }))`);
    expect((await page.evaluate<LabelCheck>(UNLABELLED)).unlabelled).toEqual([
      expect.stringContaining('ux-placeholder-only'),
    ]);
    await page.evaluate(`document.getElementById('ux-placeholder-only').remove()`);

    await page.getByLabel('Title', { exact: true }).fill(`${word} junction`);
    await length.fill('100');
    await length.press('Tab');
    await expect.poll(() => length.getAttribute('aria-invalid')).toBe('true');
    const errorId = (await length.getAttribute('aria-describedby'))!.split(' ').find((id) => id.endsWith('-error'))!;
    const error = page.locator(`#${errorId}`);
    expect(await error.innerText()).toMatch(/The length must be at least \d+ mm/);
    expect(await error.getAttribute('role')).toBe('alert');
    await screenshot(page, 'ux-field-error-desktop');

    await page.getByRole('button', { name: 'Save draft' }).click();
    await page.getByText('Some answers need changing. Each one is explained next to its field.').waitFor();
    expect(new URL(page.url()).pathname).toBe('/sell');
    expect(await page.getByLabel('Title', { exact: true }).inputValue()).toBe(`${word} junction`);
    expect(await length.inputValue()).toBe('100');

    await length.fill('1200');
    await length.press('Tab');
    await expect.poll(() => length.getAttribute('aria-invalid')).toBe(null);
    expect(await error.count()).toBe(0);
  });

  it('shows the total before the first question and asks a handful of questions, each once (line 11)', async () => {
    const browser = await openBrowser();
    try {
      const { page } = browser;
      await signIn(page, buyer);
      await page.goto(`${appUrl}/modules/${listingId}/buy`);
      const total = page.getByTestId('checkout-total');
      await total.waitFor();
      await page.getByRole('radio', { name: /Parcel courier/ }).check();
      await page.getByLabel('Delivery address', { exact: true }).waitFor();
      // Beside the questions on a wide screen (checkout.test.ts checks it comes above them on a phone): on the first screen.
      const box = (await total.boundingBox())!;
      expect(box.y + box.height).toBeLessThanOrEqual(900);
      await screenshot(page, 'ux-checkout-desktop');
      // One question per radio group (by its name) or per other field (by its label); none asked twice.
      const questions = await page.evaluate<string[]>(`(() => {
        const fields = [...document.querySelectorAll('main input:not([type=hidden]), main select, main textarea')];
        const radios = new Set(fields.filter((el) => el.type === 'radio').map((el) => 'group ' + el.name));
        const others = fields.filter((el) => el.type !== 'radio')
          .map((el) => [...el.labels].map((l) => l.textContent.trim()).join(' ') || el.id);
        return [...radios, ...others]; })()`);
      expect(questions.length).toBeGreaterThan(1);
      expect(new Set(questions).size).toBe(questions.length);
      expect(questions.length).toBeLessThanOrEqual(12);
    } finally {
      await browser.close();
    }
  });

  it('sign-in takes a pasted address and password and asks no puzzle (line 17)', async () => {
    const browser = await openBrowser();
    try {
      const { page, context } = browser;
      await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: appUrl });
      await page.goto(`${appUrl}/sign-in`);
      const email = page.getByLabel('E-mail address', { exact: true });
      const password = page.getByLabel('Password', { exact: true });
      expect(await email.getAttribute('autocomplete')).toBe('username');
      expect(await password.getAttribute('autocomplete')).toBe('current-password');
      expect(await page.locator('iframe, [class*=captcha i], [id*=captcha i]').count()).toBe(0);
      for (const [field, value] of [
        [email, buyer.email],
        [password, GOOD_PASSWORD],
      ] as const) {
        await page.evaluate(`navigator.clipboard.writeText(${JSON.stringify(value)})`);
        await field.focus();
        await page.keyboard.press('Control+V');
        expect(await field.inputValue()).toBe(value);
      }
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.waitForURL((url) => url.pathname !== '/sign-in');
    } finally {
      await browser.close();
    }
  });

  it('tells a seller whose listing was sent back what to change, with a British date (lines 18, 25)', async () => {
    const ds = app.ctx.dataSource;
    const moderator = await buildUser(ds, { role: 'moderator' });
    const listing = await buildListing(ds, seller, { title: `${word} sent back` });
    await addPhoto(app.ctx, listing, seller);
    await sellerMove(app.ctx, { id: seller.id, role: seller.role, ip: '127.0.0.1' }, listing.id, 'submit');
    const note = 'Take the club telephone number out of the description.';
    await sendBackListing(app.ctx, { id: moderator.id, role: moderator.role, ip: '127.0.0.1' }, listing.id, {
      reasons: ['contact-details', 'other'],
      note,
    });
    const { page } = desktop;
    await page.goto(`${appUrl}/modules/${listing.id}/edit`);
    const notice = page.getByRole('region', { name: 'A moderator asked for changes' });
    await notice.waitFor();
    const text = await notice.innerText();
    expect(text).toContain('Contact details must not appear in the listing');
    expect(text).toContain(note);
    expect(text).toMatch(/On \d{1,2} [A-Z][a-z]{2} \d{4}\./);
  });
});

describe('themes and widths', () => {
  it('passes axe in the dark theme, with focus rings and borders at 3:1 and no default blue (line 19)', async () => {
    const { page } = desktop;
    await page.emulateMedia({ colorScheme: 'dark' });
    try {
      for (const path of ['/', '/modules', `/modules/${listingId}`, '/sell', '/planner', '/my/listings']) {
        await page.goto(`${appUrl}${path}`);
        await page.locator('main h1').first().waitFor();
        await page.waitForLoadState('networkidle');
        const found = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa', 'wcag21aa', 'wcag22aa']).analyze();
        expect(
          found.violations.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`),
          path,
        ).toEqual([]);
      }
      await screenshot(page, 'ux-dark-my-listings-desktop');
      for (const scheme of ['dark', 'light'] as const) {
        await page.emulateMedia({ colorScheme: scheme });
        await page.goto(`${appUrl}/modules`);
        await page.locator('#search-words').waitFor();
        const c = await page.evaluate<Record<string, number | string | boolean>>(CONTRAST);
        expect(c.dark).toBe(scheme === 'dark');
        expect(c.primary).not.toBe('#409eff'); // Element Plus's default primary blue
        for (const key of ['focusOnCanvas', 'borderOnSurface', 'borderOnCanvas'])
          expect(c[key], `${scheme} ${key}`).toBeGreaterThanOrEqual(3);
      }
    } finally {
      await page.emulateMedia({ colorScheme: 'light' });
    }
  });

  it('fits a 375 px phone without sideways scrolling on the search, listing, sell and sign-in pages (lines 8, 24)', async () => {
    const phone = await openBrowser({ width: 375, height: 740 });
    try {
      const { page } = phone;
      const paths = ['/sign-in', `/modules?q=${word}`, `/modules/${listingId}`, '/sell', '/my/listings'];
      for (const path of paths) {
        if (path === '/sell') await signIn(page, seller);
        await page.goto(`${appUrl}${path}`);
        await page.locator('main h1').first().waitFor();
        await page.waitForLoadState('networkidle');
        const overflow = await page.evaluate<number>(
          'document.documentElement.scrollWidth - document.documentElement.clientWidth',
        );
        expect(overflow, path).toBeLessThanOrEqual(0);
        if (path.startsWith('/modules/')) {
          expect(await page.getByRole('button', { name: 'Show photo 1 of 2' }).isVisible()).toBe(true);
          await screenshot(page, 'ux-listing-phone');
        }
      }
    } finally {
      await phone.close();
    }
  });
});
