import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser({ width: 1280, height: 1000 });
});
afterAll(async () => browser.close());

async function signIn(page: Page, email: string, start: string) {
  await page.goto(`${appUrl}${start}`);
  await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
  await chooseAccount(page, email);
  await page.getByRole('button', { name: /sign out/i }).first().waitFor();
}

const limitNow = async (page: Page) => ((await (await page.request.get(`${appUrl}/api/staff/order-limit`)).json()) as { maxPiecesPerCustomer: number }).maxPiecesPerCustomer;

describe('fair shares and payment checks', () => {
  it('the owner sets the pieces a customer may order for one day; a bad number changes nothing; a bigger order is refused naming the limit', async () => {
    const owner = browser.page;
    await signIn(owner, 'owner@fryline.test', '/staff/');
    await owner.getByRole('link', { name: 'Shop settings' }).first().click();
    const form = owner.getByRole('form', { name: 'Fair shares' });
    const field = form.getByLabel(/pieces per customer per bake day/i);
    await field.waitFor();
    const before = await limitNow(owner);
    expect(await field.inputValue()).toBe(String(before));

    await field.fill('lots');
    await form.getByRole('button', { name: /save the limit/i }).click();
    await form.getByText(/a whole number of pieces/i).first().waitFor();
    expect(await limitNow(owner)).toBe(before);

    try {
      await field.fill('6');
      await form.getByRole('button', { name: /save the limit/i }).click();
      await form.getByRole('status').getByText(/up to 6 pieces a customer/i).waitFor();
      expect(await limitNow(owner)).toBe(6);

      // a customer's dozen is now over the limit: refused with the number in words, nothing held
      const customer = (await browser.fresh()).page;
      await signIn(customer, 'customer@fryline.test', '/');
      const days = (await (await customer.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ id: string; status: string; pickupWindows: Array<{ id: string }>; menu: Array<{ id: string; kind: string }> }>;
      const day = days.find((d) => d.status === 'open')!;
      const ring = day.menu.find((m) => m.kind === 'ring')!;
      const { token } = (await (await customer.request.get(`${appUrl}/api/csrf`)).json()) as { token: string };
      const refused = await customer.request.post(`${appUrl}/api/orders`, {
        headers: { 'x-csrf-token': token },
        data: { bakeDayId: day.id, pickupWindowId: day.pickupWindows[0]!.id, boxes: [{ size: 'dozen', items: [{ menuItemId: ring.id, quantity: 12 }] }] },
      });
      expect(refused.status()).toBe(409);
      expect(((await refused.json()) as { error: { message: string } }).error.message).toMatch(/\b6 pieces\b/);
    } finally {
      // the other journeys order dozens: put the shop's limit back as it was
      await field.fill(String(before));
      await form.getByRole('button', { name: /save the limit/i }).click();
      await form.getByRole('status').getByText(new RegExp(`up to ${before} pieces`)).waitFor();
    }
    expect(await limitNow(owner)).toBe(before);

    // the payment checks page is in the owner's menu and says where things stand
    await owner.getByRole('link', { name: 'Payment checks' }).first().click();
    await owner.getByRole('heading', { name: /^(no payment has failed its check|\d+ payments? that didn’t match)$/i }).waitFor();
  });
});
