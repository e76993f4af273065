import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser({ width: 1024, height: 1300 });
});
afterAll(async () => browser.close());

const OUNCE_G = 28.349523125; // NIST SP 811: 1 oz = 28.349523125 g

describe("the baker's night-before sheet", () => {
  it('a baker opens the production sheet, switches units, and the formula page saves a new version', async () => {
    let { page } = browser;
    // a customer holds a dozen, so tonight's sheet has something to make
    await page.goto(`${appUrl}/`);
    await page.getByRole('link', { name: /^sign in$/i }).or(page.getByRole('button', { name: /^sign in$/i })).first().click();
    await chooseAccount(page, 'sheet.customer@example.test');
    await page.getByRole('heading', { name: /upcoming bake days/i }).waitFor();
    const days = (await (await page.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ id: string; status: string; pickupWindows: Array<{ id: string }>; menu: Array<{ id: string; kind: string }> }>;
    const day = days.find((d) => d.status === 'open')!;
    const ring = day.menu.find((m) => m.kind === 'ring')!;
    const { token } = (await (await page.request.get(`${appUrl}/api/csrf`)).json()) as { token: string };
    const held = await page.request.post(`${appUrl}/api/orders`, {
      headers: { 'x-csrf-token': token },
      data: { bakeDayId: day.id, pickupWindowId: day.pickupWindows[0]!.id, boxes: [{ size: 'dozen', items: [{ menuItemId: ring.id, quantity: 12 }] }] },
    });
    expect(held.status()).toBe(201);
    ({ page } = await browser.fresh()); // a new person: their own cookies

    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'baker@fryline.test');
    await page.getByRole('heading', { name: /Baker — the next bake/ }).waitFor();

    await page.getByRole('link', { name: /^production sheet$/i }).first().click();
    await page.getByRole('heading', { name: /^Production sheet — / }).waitFor();
    await page.getByText(/Counts 1 order \(0 paid, 1 on hold\)/).waitFor();
    expect(await page.getByRole('heading', { name: /^cost and margin$/i }).count(), 'costs are for the owner').toBe(0);
    for (const section of ['Counts', 'Dough', 'Milk roux', 'Starter build', 'Cutting', 'Frying', 'Glaze', 'Schedule']) {
      await page.getByRole('heading', { name: section, exact: true }).waitFor();
    }
    // cautions are on the sheet
    const cautions = page.getByRole('complementary', { name: /safety and selling/i });
    await expect.poll(async () => (await cautions.textContent()) ?? '').toMatch(/water/i);
    await expect.poll(async () => (await cautions.textContent()) ?? '').toMatch(/local/i);

    // grams to ounces: the flour line converts at exactly 28.349523125 g per ounce
    const mixer = page.getByRole('table').filter({ hasText: /bread flour/i }).first();
    const flourRow = mixer.getByRole('row').filter({ hasText: /bread flour/i }).first();
    const gramsText = (await flourRow.textContent()) ?? '';
    const grams = Number(/([\d,]+(?:\.\d+)?)\s*g\b/.exec(gramsText)![1]!.replace(/,/g, ''));
    await page.getByRole('radio', { name: /^oz$/ }).check({ force: true }); // a visually hidden radio under a styled label
    await expect.poll(async () => (await flourRow.textContent()) ?? '').toMatch(/oz/);
    // shown as pounds and ounces, e.g. "1 lb 3.7 oz" (1 lb = 16 oz)
    const [, lb, oz] = /(?:(\d+)\s*lb\s*)?([\d.]+)\s*oz/.exec((await flourRow.textContent()) ?? '')!;
    const ounces = Number(lb ?? 0) * 16 + Number(oz);
    expect(Math.abs(ounces * OUNCE_G - grams)).toBeLessThan(OUNCE_G * 0.1);

    // temperatures to °F: the roux cooks to 65 °C = 149 °F (NIST conversion)
    await page.getByRole('radio', { name: /°F/ }).check({ force: true });
    await page.getByText(/149\s*°F/).first().waitFor();

    // formula: a new version is saved, and already-planned days keep theirs
    await page.getByRole('link', { name: /^formula$/i }).first().click();
    await page.getByRole('heading', { name: 'Ingredients' }).waitFor();
    await page.getByLabel(/note for this version/i).fill('Less sugar for the spring menu');
    await page.getByRole('button', { name: /save new version/i }).click();
    await page.getByText(/Saved as version 2\. Bake days already planned keep their version\./).waitFor();

    await page.getByRole('link', { name: /^production sheet$/i }).first().click();
    await page.getByRole('button', { name: /switch this bake day to version 2/i }).waitFor();
  });

  it("the owner sees what a piece costs in each dough, and the baker does not", async () => {
    const { page } = await browser.fresh();
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'owner@fryline.test');
    await page.goto(`${appUrl}/staff/production`);
    await page.getByRole('heading', { name: /^Production sheet — / }).waitFor();
    await page.getByRole('heading', { name: /^cost and margin$/i }).waitFor();
    // the demo's flavoured doughs (lemon zest added to the base dough; a brown-butter formula of its own) each get a table
    for (const name of [/^base dough, cost per piece$/i, /^lemon zest dough, cost per piece$/i, /^brown butter dough, cost per piece$/i]) {
      const table = page.getByRole('table', { name });
      await table.waitFor();
      const plainRing = await table.getByRole('row', { name: /^plain/i }).getByRole('cell').first().innerText();
      expect(plainRing).toMatch(/^\$\d+\.\d\d$/);
      expect(Number(plainRing.slice(1))).toBeGreaterThan(0);
    }
    await page.close();
  });

  it('the counter cannot open the sheet', async () => {
    const { page } = await browser.fresh();
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'counter@fryline.test');
    await page.getByRole('heading', { name: /Counter — pickups/ }).waitFor();
    expect(await page.getByRole('link', { name: /^production sheet$/i }).count()).toBe(0);
    await page.goto(`${appUrl}/staff/production`);
    await page.getByText(/not part of your role/i).first().waitFor();
    await page.close();
  });
});
