import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl, mailUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser({ width: 1280, height: 1000 });
});
afterAll(async () => browser.close());

/** A picture of the screen for a person to look at, when SCREENSHOT_DIR says where (never in the repo). */
async function shot(page: Page, name: string) {
  const dir = process.env.SCREENSHOT_DIR;
  if (dir) await page.screenshot({ path: `${dir}/${name}.png`, fullPage: true });
}

/** A bake day of this test's own, ten days out, so calling it off touches no other journey. */
async function announceOwnDay(page: Page, place: string): Promise<string> {
  const { token } = (await (await page.request.get(`${appUrl}/api/csrf`)).json()) as { token: string };
  const menu = (await (await page.request.get(`${appUrl}/api/staff/menu-items`)).json()) as Array<{ id: string; active: boolean }>;
  const date = new Date(Date.now() + 10 * 86_400_000).toISOString().slice(0, 10);
  const res = await page.request.post(`${appUrl}/api/staff/bake-days`, {
    headers: { 'x-csrf-token': token },
    data: {
      date, place, timeZone: 'America/Denver', windows: [{ start: '09:00', end: '10:00', maxOrders: 20 }, { start: '10:00', end: '11:00' }],
      menuItemIds: menu.filter((m) => m.active).map((m) => m.id), boxes: [{ size: 'dozen', pieces: 12, priceCents: 3000 }], ringCapacity: 48, holeCapacity: 0,
    },
  });
  expect(res.status()).toBe(201);
  return ((await res.json()) as { id: string }).id;
}

describe("the owner's back office", () => {
  it('a customer asks for news of bake days; the owner changes a bake day, reads the week’s sales with its CSV, and calls a day off', async () => {
    let { page } = browser;
    await page.goto(`${appUrl}/`);
    await page.getByRole('heading', { name: /hear about new bake days/i }).waitFor();
    await page.getByLabel(/your e-mail/i).fill('news.reader@example.test');
    await page.getByRole('button', { name: /^tell me$/i }).click();
    await page.getByText(/check your inbox/i).waitFor();
    await shot(page, 'shop-news-signup');
    // the confirmation link from the e-mail (the outbox relay sends it within a few seconds)
    let confirmLink = '';
    await expect
      .poll(async () => {
        const list = (await (await fetch(`${mailUrl}/api/messages?to=news.reader@example.test`)).json()) as Array<{ id: string; subject: string }>;
        const message = list.find((m) => /please confirm/i.test(m.subject));
        if (!message) return '';
        const full = (await (await fetch(`${mailUrl}/api/messages/${message.id}`)).json()) as { text: string };
        confirmLink = /(https?:\/\/\S+\/news\/confirm\?token=[\w-]+)/.exec(full.text)?.[1] ?? '';
        return confirmLink;
      }, { timeout: 30_000 })
      .not.toBe('');
    await page.goto(confirmLink);
    await page.getByText(/thank you: news\.reader@example\.test will get one e-mail/i).waitFor();
    await shot(page, 'shop-news-confirmed');
    // the page behind an e-mail's unsubscribe link: a button, nothing done by opening it
    await page.goto(`${appUrl}/news/unsubscribe?token=${'x'.repeat(32)}`);
    await page.getByRole('button', { name: /stop the e-mails/i }).waitFor();
    await shot(page, 'shop-news-unsubscribe');
    await page.getByRole('button', { name: /stop the e-mails/i }).click();
    await page.getByText(/this link doesn't work/i).waitFor();

    ({ page } = await browser.fresh());
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'owner@fryline.test');
    await page.getByRole('heading', { name: /Owner — overview/ }).waitFor();
    const dayId = await announceOwnDay(page, 'Quarry Road hall');

    // from the bake day's orders to its change page
    await page.goto(`${appUrl}/staff/bake-days/${dayId}`);
    await page.getByRole('link', { name: /change or call off this bake day/i }).click();
    await page.getByRole('heading', { name: /^Change / }).waitFor();
    await page.getByRole('textbox', { name: /^place$/i }).fill('Quarry Road hall, back door');
    await page.getByRole('button', { name: /save place/i }).click();
    await page.getByRole('status').filter({ hasText: /saved/i }).first().waitFor();
    await expect.poll(async () => (await page.getByRole('status').filter({ hasText: /saved/i }).first().textContent()) ?? '').toMatch(/Quarry Road hall, back door/);
    // a cap the window already has room for; then a second window moved later
    await page.getByRole('textbox', { name: /^most orders/i }).first().fill('30');
    await page.getByRole('button', { name: /save pickup windows/i }).click();
    await page.getByText(/at most 30 orders/i).waitFor();
    await shot(page, 'staff-bake-day-change');

    // the week's sales: charts with their tables, and the CSV
    await page.getByRole('link', { name: /^sales$/i }).first().click();
    await page.getByRole('heading', { name: /^sales$/i, level: 1 }).waitFor();
    await page.getByRole('heading', { name: /^money$/i }).waitFor();
    await page.getByRole('table', { name: /money this week and the week before/i }).waitFor();
    await expect.poll(async () => page.locator('.recharts-surface').count()).toBeGreaterThanOrEqual(1);
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('link', { name: /download csv/i }).click()]);
    expect(download.suggestedFilename()).toMatch(/^sales-week-\d{4}-\d{2}-\d{2}\.csv$/);
    await shot(page, 'staff-sales');
    await page.getByRole('button', { name: /week before/i }).click();
    await page.getByText(/^.+ to .+\(America\/Denver\)\.$/).waitFor();

    // calling the day off, with its progress to the end
    await page.goto(`${appUrl}/staff/bake-days/${dayId}/edit`);
    await page.getByRole('heading', { name: /call this bake day off/i }).waitFor();
    await page.getByLabel(/why \(customers read this\)/i).fill('Ice on the roads');
    await page.getByLabel(/yes, refund everyone/i).check();
    await page.getByRole('button', { name: /call off the bake day/i }).click();
    await page.getByText(/all done: every paid order is refunded/i).waitFor({ timeout: 60_000 });
    await page.getByText(/called off: nothing about it can change/i).waitFor();
    await shot(page, 'staff-call-off');
  });
});
