import { readFile } from 'node:fs/promises';
import type { Page } from 'playwright-core';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { openBrowser, screenshot, type BrowserSession } from '../support/browser';
import { buildUser, GOOD_PASSWORD } from '../support/factories';
import { testConfig } from '../support/test-env';

const appUrl = inject('appUrl');
let dataSource: DataSource;
let browser: BrowserSession;

beforeAll(async () => {
  dataSource = createDataSource(testConfig().db);
  await dataSource.initialize();
  browser = await openBrowser();
});
afterAll(async () => {
  await browser?.close();
  await dataSource?.destroy();
});

/** How many cross members the cutting list asks for, over every row of them. */
async function crossMembersToCut(page: Page): Promise<number> {
  const rows = page
    .locator('#plan-cutting tbody tr')
    .filter({ has: page.locator('th', { hasText: /^Cross member$/ }) });
  const counts = await rows.locator('td:nth-of-type(4)').allInnerTexts();
  return counts.reduce((sum, text) => sum + Number(text), 0);
}

/** A full-page screenshot from the top, so the sticky header sits where a person sees it. */
async function shoot(page: Page, name: string): Promise<void> {
  await page.evaluate('window.scrollTo(0, 0)');
  await screenshot(page, name);
}

/** Press a download button and read what the browser saved. */
async function download(page: Page, button: string): Promise<{ name: string; bytes: Buffer }> {
  const [saved] = await Promise.all([
    page.waitForEvent('download'),
    page.getByRole('button', { name: button }).click(),
  ]);
  return { name: saved.suggestedFilename(), bytes: await readFile((await saved.path())!) };
}

describe('the frame planner in the browser', () => {
  it('plans a two-level room as a visitor, downloads it, then saves and shares it once signed in', async () => {
    const { page } = browser;
    await page.goto(`${appUrl}/planner`);
    await page.getByRole('heading', { level: 1, name: 'Frame planner' }).waitFor();

    // Start from the two-level room and change the cross-member spacing: the plan follows as it is typed.
    await page.getByLabel('Start from').selectOption('room');
    await page.getByRole('button', { name: 'Start', exact: true }).click();
    await expect.poll(() => page.locator('#plan-summary').innerText()).toContain('13 on the upper level');
    const before = await crossMembersToCut(page);
    await page.getByLabel('Cross-member spacing (mm)').fill('300');
    await expect.poll(() => crossMembersToCut(page)).toBeGreaterThan(before);

    // The results: a cutting list with rows, the weight, and a verdict on every sag check.
    expect(await page.locator('#plan-cutting tbody tr').count()).toBeGreaterThan(5);
    expect(await page.locator('#plan-summary').innerText()).toMatch(/Total weight\s+\d+\.\d kg/);
    const verdicts = await page.locator('#plan-sag .bw-badge').allInnerTexts();
    expect(verdicts.length).toBeGreaterThan(0);
    for (const verdict of verdicts) expect(verdict).toMatch(/^(Passes|Sags too much)$/);
    expect(await page.locator('#plan-safety').innerText()).toContain('Follow your local rules');
    await shoot(page, 'planner-desktop');

    const csv = await download(page, 'Cutting list (CSV)');
    expect(csv.name).toBe('baseboard-plan-cutting-list.csv');
    const header = csv.bytes
      .toString('utf8')
      .replace(/^\uFEFF/, '')
      .split('\r\n')[0];
    expect(header).toBe('Part,Kind,Material,Section or thickness,Length (mm),Width (mm),Quantity,Boards');
    const pdf = await download(page, 'Whole plan (PDF)');
    expect(pdf.name).toBe('baseboard-plan.pdf');
    expect(pdf.bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');

    // A visitor names the plan and is sent to sign in; on return it is saved under that name, and the address is the
    // saved plan's, without the request to save.
    const member = await buildUser(dataSource, { displayName: 'Nell Fiddleyard' });
    await page.getByRole('button', { name: 'Save to my account' }).click();
    const dialog = page.getByRole('dialog', { name: 'Save this plan to your account' });
    await dialog.getByLabel('Plan name').fill('Spare room, two levels');
    await dialog.getByRole('button', { name: 'Sign in and save' }).click();
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail address', { exact: true }).fill(member.email);
    await page.getByLabel('Password', { exact: true }).fill(GOOD_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(/\/planner\/\d+$/);
    expect(new URL(page.url()).search).toBe('');
    expect(await page.getByRole('status').filter({ hasText: 'Saved as “Spare room, two levels”.' }).count()).toBe(1);
    await page.getByRole('heading', { level: 1, name: 'Spare room, two levels' }).waitFor();
    expect(await crossMembersToCut(page)).toBeGreaterThan(before);

    // By keyboard, as the switch's own checkbox is drawn over by its track.
    await page.getByRole('switch', { name: 'Share Spare room, two levels with a read-only link' }).focus();
    await page.keyboard.press('Space');
    const link = page.getByLabel('Read-only link to Spare room, two levels');
    await link.waitFor();
    const shareUrl = new URL(await link.inputValue());
    expect(shareUrl.pathname).toMatch(/^\/planner\/shared\/[A-Za-z0-9_-]{43}$/);
    await shoot(page, 'planner-saved-shared');

    // Anyone with the link sees the plan, read-only.
    const stranger = await openBrowser({ width: 375, height: 740 });
    try {
      await stranger.page.goto(`${appUrl}${shareUrl.pathname}`);
      await stranger.page.getByRole('heading', { level: 1, name: 'Spare room, two levels' }).waitFor();
      expect(await stranger.page.getByText('Shared by Nell Fiddleyard').count()).toBe(1);
      expect(await stranger.page.getByText('read-only').count()).toBeGreaterThan(0);
      expect(await stranger.page.getByRole('textbox', { name: /Cross-member spacing/ }).count()).toBe(0);
      await stranger.page.locator('#plan-cutting tbody tr').first().waitFor();
      expect(await crossMembersToCut(stranger.page)).toBeGreaterThan(before);
      await shoot(stranger.page, 'planner-shared-phone');
    } finally {
      await stranger.close();
    }
  });

  it('lays the planner out for a 375 px phone, inputs first, without sideways scrolling', async () => {
    const phone = await openBrowser({ width: 375, height: 740 });
    try {
      await phone.page.goto(`${appUrl}/planner`);
      await phone.page.locator('#plan-summary').waitFor();
      const widths = await phone.page.evaluate<number[]>('[document.documentElement.scrollWidth, window.innerWidth]');
      expect(widths[0]).toBeLessThanOrEqual(widths[1]!);
      const inputsTop = await phone.page.getByRole('heading', { name: 'Your boards' }).boundingBox();
      const planTop = await phone.page.getByRole('heading', { name: 'The plan' }).boundingBox();
      expect(inputsTop!.y).toBeLessThan(planTop!.y);
      await shoot(phone.page, 'planner-phone');

      // In feet and inches, the plan's warnings quote lengths in feet and inches too: 12 mm → 1/2" (nearest 1/16 in).
      await phone.page.getByLabel('Start from').selectOption('room');
      await phone.page.getByRole('button', { name: 'Start', exact: true }).click();
      await phone.page.getByRole('radiogroup', { name: 'Show lengths in' }).getByText('ft-in').click();
      await expect
        .poll(() => phone.page.locator('#plan-summary').innerText())
        .toContain('The floor falls up to 1/2": each kickboard is cut that much taller');
      expect(await phone.page.locator('#plan-summary').innerText()).not.toMatch(/\d mm\b/);
      await shoot(phone.page, 'planner-phone-ft-in');
    } finally {
      await phone.close();
    }
  });
});
