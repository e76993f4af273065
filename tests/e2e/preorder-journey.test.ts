import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl, mailUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser();
});
afterAll(async () => browser.close());

describe('a customer pre-orders a mixed dozen, pays, gets the code by e-mail, then cancels', () => {
  it('the whole journey in Chromium', async () => {
    const { page } = browser;
    // sign in first, from the shop
    await page.goto(`${appUrl}/`);
    await page.getByRole('link', { name: /^sign in$/i }).or(page.getByRole('button', { name: /^sign in$/i })).first().click();
    await chooseAccount(page, 'customer@fryline.test');
    await page.getByRole('heading', { name: /upcoming bake days/i }).waitFor();

    // the first open bake day
    await page.getByRole('link', { name: /choose your box/i }).first().click();
    await page.getByRole('group', { name: /choose a pickup window/i }).getByRole('radio').first().check();
    await page.getByRole('button', { name: /a dozen/i }).click();
    // a mix: 4 vanilla bean, then fill the rest with brown butter maple
    for (let i = 0; i < 4; i += 1) await page.getByRole('button', { name: /one more vanilla bean glaze/i }).first().click();
    await page.getByLabel(/fill the other 8 with/i).selectOption({ label: 'Brown Butter Maple' });
    await page.getByRole('button', { name: /^fill$/i }).click();
    await page.getByText(/12 of 12/).waitFor();
    // dozen $30.00 + 8 × $0.50 surcharge (priced from the demo menu)
    await page.getByText('$34.00').first().waitFor();
    await page.getByRole('button', { name: /review order/i }).click();
    await page.getByText(/contains .*eggs/i).first().waitFor();
    await page.getByRole('checkbox', { name: /i have read the allergens/i }).check();
    await page.getByRole('button', { name: /pay \$34\.00/i }).click();

    // the payments stand-in's hosted page, with Stripe's published success card
    await page.getByRole('heading', { name: /pay \$34\.00/i }).waitFor();
    await page.getByLabel(/card number/i).fill('4242 4242 4242 4242');
    await page.getByLabel(/expiry/i).fill('12/34');
    await page.getByLabel(/security code/i).fill('123');
    await page.getByRole('button', { name: /^pay/i }).click();

    // back in the shop: the page waits for the webhook, then shows the code
    await page.waitForURL(/\/orders\/[0-9a-f-]+\?paid=1/);
    await page.getByText(/your pickup code/i).waitFor({ timeout: 30_000 });
    const orderId = new URL(page.url()).pathname.split('/').at(-1)!;
    const order = (await (await page.request.get(`${appUrl}/api/orders/${orderId}`)).json()) as { pickupCode: string; status: string };
    expect(order.status).toBe('paid');
    expect(order.pickupCode).toMatch(/^[A-Z0-9]{6}$/);
    await page.getByText(order.pickupCode, { exact: true }).first().waitFor();
    await expect.poll(() => page.getByRole('img', { name: new RegExp(`QR code for pickup code ${order.pickupCode}`) }).count()).toBe(1);

    // the confirmation e-mail went out through the outbox to the mail stand-in
    await expect
      .poll(async () => ((await (await fetch(`${mailUrl}/api/messages?to=customer@fryline.test`)).json()) as Array<{ subject: string }>).map((m) => m.subject).join('\n'), { timeout: 20_000 })
      .toContain(order.pickupCode);

    // cancel before the cut-off: refunded
    await page.getByRole('button', { name: /^cancel order$/i }).click();
    await page.getByRole('button', { name: /yes, cancel and refund/i }).click();
    await page.getByText(/\$34\.00 goes back to the card you paid with/i).first().waitFor();
    const after = (await (await page.request.get(`${appUrl}/api/orders/${orderId}`)).json()) as { status: string; refundedCents: number };
    expect(after).toMatchObject({ status: 'cancelled', refundedCents: 3400 });
    await expect
      .poll(async () => ((await (await fetch(`${mailUrl}/api/messages?to=customer@fryline.test`)).json()) as Array<{ subject: string }>).map((m) => m.subject).join('\n'), { timeout: 20_000 })
      .toMatch(/cancelled/i);
  });
});
