import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** Debian's Chromium; never a downloaded browser. */
export const CHROMIUM = '/usr/bin/chromium';
const ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export const ARTIFACTS = path.resolve('tests/.artifacts');

export interface BrowserSession {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** A fresh headless Chromium profile with one page, at a desktop or phone width. */
export async function openBrowser(viewport = { width: 1280, height: 900 }): Promise<BrowserSession> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'bw-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    args: ARGS,
    viewport,
    locale: 'en-GB',
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Keep a screenshot for a person to read after the run. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(ARTIFACTS, { recursive: true });
  const file = path.join(ARTIFACTS, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/** Sign in through the sign-in page as a person would, and wait until the app has moved on. */
export async function signInThroughPage(page: Page, appUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${appUrl}/sign-in`);
  await page.getByLabel('E-mail address', { exact: true }).fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => url.pathname !== '/sign-in');
}
