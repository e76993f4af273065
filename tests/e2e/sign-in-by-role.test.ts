import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => browser.close());

describe('signing in through the account chooser lands each role on its home', () => {
  it('the shop lists the demo bake days before anyone signs in', async () => {
    const { page } = browser;
    await page.goto(`${appUrl}/`);
    await page.getByRole('heading', { name: /upcoming bake days/i }).waitFor();
    const cards = page.getByRole('link', { name: /choose your box/i });
    await expect.poll(() => cards.count()).toBeGreaterThanOrEqual(2);
    await expect.poll(() => page.getByText(/Larkspur Landing market/).count()).toBeGreaterThanOrEqual(2);
  });

  for (const [email, heading] of [
    ['owner@fryline.test', /Owner — overview/],
    ['baker@fryline.test', /Baker — the next bake/],
    ['counter@fryline.test', /Counter — pickups/],
  ] as const) {
    it(`${email} signs in from the staff app and sees their home`, async () => {
      const { page } = await browser.fresh();
      await page.goto(`${appUrl}/staff/`);
      await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
      await page.getByRole('heading', { name: /choose an account/i }).waitFor();
      await chooseAccount(page, email);
      await page.getByRole('heading', { name: heading }).waitFor();
      expect(new URL(page.url()).pathname).toMatch(/^\/staff\/?$/);
      await page.close();
    });
  }

  it('a customer signs in from the shop and is kept out of the staff app', async () => {
    const { page } = await browser.fresh();
    await page.goto(`${appUrl}/`);
    await page.getByRole('link', { name: /^sign in$/i }).or(page.getByRole('button', { name: /^sign in$/i })).first().click();
    await chooseAccount(page, 'customer@fryline.test');
    await page.getByRole('heading', { name: /upcoming bake days/i }).waitFor();
    await expect.poll(() => page.getByText(/Dana/).count()).toBeGreaterThan(0);
    await page.goto(`${appUrl}/staff/`);
    await page.waitForURL((url) => !url.pathname.startsWith('/staff'));
    await page.getByRole('heading', { name: /upcoming bake days/i }).waitFor();
    await page.close();
  });

  it('a denied consent lands on the sign-in page with an explanation and no session', async () => {
    const { page } = await browser.fresh();
    await page.goto(`${appUrl}/`);
    await page.getByRole('link', { name: /^sign in$/i }).or(page.getByRole('button', { name: /^sign in$/i })).first().click();
    await page.getByRole('button', { name: /deny/i }).click();
    await page.waitForURL(/\/signin\?error=access_denied/);
    await page.getByRole('button', { name: /try again/i }).or(page.getByRole('link', { name: /try again/i })).first().waitFor();
    const me = await page.request.get(`${appUrl}/api/me`);
    expect(me.status()).toBe(401);
    await page.close();
  });
});
