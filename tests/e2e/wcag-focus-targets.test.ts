import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AppInstance } from '../../server/app';
import type { User } from '../../server/features/users/user.entity';
import { openBrowser, screenshot, signInThroughPage, type BrowserSession } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { buildListedListing } from '../support/listing-factories';
import { startTestApp } from '../support/test-app';

/**
 * WCAG 2.2 checks that axe cannot make, because they need the keyboard and the layout: 2.4.7 Focus Visible (the
 * focused element looks different from the unfocused one), 2.4.11 Focus Not Obscured (Minimum) (no focused element
 * sits entirely under the sticky header), and 2.5.8 Target Size (Minimum) (24 × 24 CSS px, or 24 px of spacing,
 * with the criterion's exception for links inline in a sentence).
 */
const appUrl = inject('appUrl');
let app: AppInstance;
let member: User;
let listingId: number;

beforeAll(async () => {
  app = await startTestApp();
  member = await buildUser(app.ctx.dataSource, { displayName: 'Tamsin Bracket' });
  const moderator = await buildUser(app.ctx.dataSource, { role: 'moderator' });
  listingId = (await buildListedListing(app.ctx, member, moderator, { title: 'EM fiddle yard, three boards' })).id;
}, 60_000);
afterAll(() => app?.close());

/** In-page helpers (plain strings: the page has the DOM, this file's types do not). */
const HELPERS = `
  const FOCUSABLE = 'a[href], button, input:not([type=hidden]), select, textarea, [tabindex]:not([tabindex="-1"]), summary';
  const shown = (el) => { const r = el.getBoundingClientRect(); const s = getComputedStyle(el);
    return r.width > 0 && r.height > 0 && s.visibility !== 'hidden' && !el.closest('[aria-hidden="true"], [inert]'); };
  const name = (el) => (el.tagName.toLowerCase() + (el.id ? '#' + el.id : '') + ' "' +
    (el.getAttribute('aria-label') || el.innerText || el.value || el.getAttribute('placeholder') || '').trim().slice(0, 40) + '"');
  const ring = (el) => { const s = getComputedStyle(el);
    return [s.outlineStyle, s.outlineWidth, s.outlineColor, s.boxShadow, s.borderColor, s.backgroundColor].join('|'); };
  /* The ring may be drawn on the element, a wrapper (Element Plus inputs) or a sibling (its checkboxes). */
  const look = (el) => { const parts = [el, el.parentElement, el.parentElement?.parentElement, el.parentElement?.parentElement?.parentElement,
    el.nextElementSibling, el.previousElementSibling].filter(Boolean); return parts.map(ring).join('||'); };
`;

/** Remember how every focusable element looks before anything has focus. */
const SNAPSHOT = `(() => { ${HELPERS}
  window.__bwLooks = new Map([...document.querySelectorAll(FOCUSABLE)].map((el) => [el, look(el)]));
  return window.__bwLooks.size; })()`;

/** The focused element: where it is against the sticky header, and whether it looks different from unfocused. */
const FOCUSED = `(() => { ${HELPERS}
  const el = document.activeElement;
  if (!el || el === document.body) return null;
  const header = document.querySelector('header');
  const r = el.getBoundingClientRect();
  /* What is painted on top at the centre and near each corner of the focused box: the header, or not. */
  const points = [[0.5, 0.5], [0.1, 0.1], [0.9, 0.1], [0.1, 0.9], [0.9, 0.9]]
    .map(([x, y]) => document.elementFromPoint(r.left + r.width * x, r.top + r.height * y));
  const underHeader = points.map((hit) => hit !== null && header.contains(hit));
  const before = window.__bwLooks.get(el);
  const first = window.__bwFirst ?? (window.__bwFirst = el);
  return { name: name(el), again: first === el && window.__bwSteps++ > 0, inHeader: header.contains(el),
    hidden: underHeader.every(Boolean), partly: underHeader.some(Boolean),
    changed: before === undefined ? 'new' : String(before !== look(el)) }; })()`;

interface Focused {
  name: string;
  again: boolean;
  inHeader: boolean;
  hidden: boolean;
  partly: boolean;
  changed: 'true' | 'false' | 'new';
}

/** Tab through the page until focus comes back to where it started; collect every failure. */
async function tabThrough(page: Page, limit = 400) {
  await page.evaluate(SNAPSHOT);
  await page.evaluate('window.__bwFirst = undefined; window.__bwSteps = 0');
  const failures: string[] = [];
  const partlyCovered: string[] = [];
  let visited = 0;
  let appeared = 0;
  for (; visited < limit; visited += 1) {
    await page.keyboard.press('Tab');
    const f = await page.evaluate<Focused | null>(FOCUSED);
    if (!f) continue;
    if (f.again) break;
    if (f.changed === 'false') failures.push(`2.4.7 no visible focus: ${f.name}`);
    if (f.changed === 'new') appeared += 1;
    if (!f.inHeader && f.hidden) failures.push(`2.4.11 hidden under the header: ${f.name}`);
    else if (!f.inHeader && f.partly) partlyCovered.push(f.name);
  }
  return { visited, failures, partlyCovered, appeared };
}

/** Every interactive target smaller than 24 × 24 px with less than 24 px of room (WCAG 2.5.8), and the exceptions. */
const TARGETS = `(() => { ${HELPERS}
  const targets = [...document.querySelectorAll(FOCUSABLE + ', [role=button], [role=tab], [role=option]')]
    .map((el) => (el.matches('input[type=checkbox], input[type=radio]') && el.closest('label')) || el)
    .filter((el, i, all) => shown(el) && all.indexOf(el) === i && !all.some((o) => o !== el && o.contains(el) && shown(o) && o.matches('label')));
  /* WCAG 2.5.8 "Inline": a link inside a sentence of running text, sized by the text's line height. */
  const inline = (el) => { if (el.tagName !== 'A' || getComputedStyle(el).display !== 'inline') return false;
    const text = el.parentElement.closest('p, dd, td, figcaption');
    return text !== null && text.innerText.trim().length > el.innerText.trim().length + 3; };
  const box = (el) => el.getBoundingClientRect();
  const small = targets.filter((el) => { const r = box(el); return r.width < 23.5 || r.height < 23.5; });
  const centre = (r) => [r.left + r.width / 2, r.top + r.height / 2];
  const gap = (c, r) => Math.hypot(Math.max(r.left - c[0], 0, c[0] - r.right), Math.max(r.top - c[1], 0, c[1] - r.bottom));
  const failures = [], exceptions = [];
  for (const el of small) {
    const r = box(el); const c = centre(r);
    if (inline(el)) { exceptions.push('inline link ' + name(el)); continue; }
    const crowded = targets.some((o) => o !== el && !o.contains(el) && !el.contains(o) &&
      (gap(c, box(o)) < 12 || (small.includes(o) && Math.hypot(c[0] - centre(box(o))[0], c[1] - centre(box(o))[1]) < 24)));
    if (crowded) failures.push(name(el) + ' ' + Math.round(r.width) + '×' + Math.round(r.height));
  }
  return { count: targets.length, failures, exceptions }; })()`;

/** The pages, as a signed-in member sees them (the sell form needs one). */
const PAGES: [string, () => string][] = [
  ['home', () => '/'],
  ['search', () => '/modules'],
  ['listing', () => `/modules/${listingId}`],
  ['sell form', () => '/sell'],
  ['planner', () => '/planner'],
];

/** Open a page as a person would and wait until it has settled. */
async function open(page: Page, path: string): Promise<void> {
  await page.goto(`${appUrl}${path}`);
  await page.locator('main h1').first().waitFor();
  await page.getByText(/Loading/).waitFor({ state: 'detached' });
  await page.waitForLoadState('networkidle');
}

describe.each([
  ['desktop', { width: 1280, height: 900 }],
  ['phone', { width: 375, height: 740 }],
])('keyboard focus and target size on a %s', (size, viewport) => {
  let browser: BrowserSession;
  beforeAll(async () => {
    browser = await openBrowser(viewport);
    await browser.page.emulateMedia({ reducedMotion: 'reduce' });
    await signInThroughPage(browser.page, appUrl, member.email, GOOD_PASSWORD);
  });
  afterAll(() => browser?.close());

  it.each(PAGES)(
    'keeps focus visible and clear of the header, with targets of 24 px, on the %s',
    async (page, path) => {
      const { page: tab } = browser;
      await open(tab, path());

      const targets = await tab.evaluate<{ count: number; failures: string[]; exceptions: string[] }>(TARGETS);
      const focus = await tabThrough(tab);
      await screenshot(tab, `wcag-${size}-${page.replace(' ', '-')}`);

      console.log(
        `${size} ${page}: ${focus.visited} focus stops (${focus.appeared} appeared after load), ${targets.count} targets; ` +
          `inline links exempted: ${targets.exceptions.join(', ') || 'none'}; ` +
          `partly under the header: ${focus.partlyCovered.join(', ') || 'none'}`,
      );
      expect(focus.visited).toBeGreaterThan(3);
      expect(focus.failures).toEqual([]);
      expect(targets.failures).toEqual([]);
    },
  );

  it('finds a missing focus ring and crowded small targets when a page has them', async () => {
    const { page } = browser;
    await open(page, '/');
    await page.addStyleTag({ content: 'html body *:focus-visible { outline: none !important; }' });
    await page.evaluate(
      `document.querySelector('main h1').insertAdjacentHTML('afterend',
        '<span><button style="width:12px;height:12px;padding:0">a</button><button style="width:12px;height:12px;padding:0">b</button></span>')`,
    );

    const targets = await page.evaluate<{ failures: string[] }>(TARGETS);
    const focus = await tabThrough(page);

    expect(targets.failures).toEqual(['button "a" 12×12', 'button "b" 12×12']);
    expect(focus.failures.some((f) => f.startsWith('2.4.7 no visible focus'))).toBe(true);
  });
});
