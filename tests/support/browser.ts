import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

const CHROMIUM = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';

/** Debian's Chromium with a fresh profile, headless, kept off the network. */
export async function openBrowser(viewport = { width: 390, height: 844 }): Promise<{ context: BrowserContext; page: Page; close(): Promise<void> }> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'fryline-e2e-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: CHROMIUM,
    headless: true,
    viewport,
    args: ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'],
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Signs in on the sign-in page by choosing a listed account (or typing a new address). */
export async function chooseAccount(page: Page, email: string) {
  const listed = page.getByRole('button', { name: new RegExp(email.replace(/[.@]/g, '\\$&'), 'i') });
  if (await listed.count()) await listed.first().click();
  else {
    await page.getByLabel(/e-?mail/i).fill(email);
    await page.getByRole('button', { name: /continue|sign in/i }).click();
  }
}

/**
 * Leaves the current page (so nothing still polling can set a cookie again)
 * and forgets every cookie: the next sign-in starts from nothing.
 */
export async function forgetSession(page: Page, context: BrowserContext) {
  await page.goto('about:blank');
  await context.clearCookies();
}
