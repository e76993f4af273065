import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, chooseAccount, payWithTestCard } from '../support/browser.js';

const { appUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser({ width: 1024, height: 1200 });
});
afterAll(async () => browser.close());

describe('the owner refunds part of an order, then the rest', () => {
  it('from the bake day’s order list, with the figures right after each refund', async () => {
    let { page } = browser;
    // a customer pays for a half dozen on the second bake day
    await page.goto(`${appUrl}/`);
    await page.getByRole('link', { name: /^sign in$/i }).or(page.getByRole('button', { name: /^sign in$/i })).first().click();
    await chooseAccount(page, 'refund.customer@example.test');
    await page.getByRole('heading', { name: /upcoming bake days/i }).waitFor();
    const days = (await (await page.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ id: string; date: string; status: string; pickupWindows: Array<{ id: string }>; menu: Array<{ id: string; kind: string }> }>;
    const day = days.filter((d) => d.status === 'open')[1]!;
    const ring = day.menu.find((m) => m.kind === 'ring')!;
    const { token } = (await (await page.request.get(`${appUrl}/api/csrf`)).json()) as { token: string };
    const created = (await (
      await page.request.post(`${appUrl}/api/orders`, {
        headers: { 'x-csrf-token': token },
        data: { bakeDayId: day.id, pickupWindowId: day.pickupWindows[2]!.id, boxes: [{ size: 'half-dozen', items: [{ menuItemId: ring.id, quantity: 6 }] }] },
      })
    ).json()) as { id: string; checkoutUrl: string; totalCents: number };
    await payWithTestCard(page, created.checkoutUrl);
    ({ page } = await browser.fresh()); // a new person: their own cookies

    // the owner finds it and refunds $5.00, then the rest
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'owner@fryline.test');
    await page.getByRole('heading', { name: /Owner — overview/ }).waitFor();
    await page.getByRole('link', { name: /^bake days$/i }).first().click();
    await page.getByRole('link', { name: /^Orders for / }).nth(1).click();
    await page.getByRole('heading', { name: /^Orders for / }).waitFor();
    await page.getByRole('searchbox', { name: /find an order/i }).fill('refund.customer');
    const order = page.getByRole('article').filter({ hasText: /refund\.customer|Refund Customer/i }).first();
    await order.getByRole('button', { name: /^refund/i }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByRole('radio', { name: /^part$/i }).check({ force: true });
    await dialog.getByLabel(/amount in dollars/i).fill('5.00');
    await dialog.getByLabel(/reason/i).fill('One doughnut was dropped');
    await dialog.getByRole('button', { name: /^refund \$5\.00$/i }).click();
    const left = ((created.totalCents - 500) / 100).toFixed(2);
    await page.getByText(new RegExp(`Refunded \\$5\\.00 .*\\$${left.replace('.', '\\.')} is left to refund`)).waitFor();

    // the list has caught up with the first refund before the second one starts
    await expect.poll(async () => (await order.textContent()) ?? '').toMatch(/Refunded\s*\$5\.00/);
    await order.getByRole('button', { name: /^refund/i }).click();
    await dialog.getByLabel(/reason/i).fill('Stall closed early');
    await dialog.getByRole('button', { name: new RegExp(`^refund \\$${left.replace('.', '\\.')}$`, 'i') }).click();
    await page.getByText(/the order is now refunded/i).waitFor();

    const after = (await (await page.request.get(`${appUrl}/api/staff/bake-days/${day.id}/orders`)).json()) as Array<{ id: string; status: string; refundedCents: number }>;
    expect(after.find((o) => o.id === created.id)).toMatchObject({ status: 'refunded', refundedCents: created.totalCents });
  });
});
