import { createRequire } from 'node:module';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DateTime } from 'luxon';
import sharp from 'sharp';
import type { Page } from 'playwright-core';
import { openBrowser, chooseAccount, payWithTestCard } from '../support/browser.js';

// The CSV (RFC 4180) is read back with csv-parse from the registry, the API workspace's own dependency
const { parse } = createRequire(new URL('../../apps/api/package.json', import.meta.url))('csv-parse/sync') as {
  parse(input: string, options: { columns: true }): Array<Record<string, string>>;
};

const { appUrl, paymentsUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser({ width: 1024, height: 1300 });
});
afterAll(async () => browser.close());

const ITEM = 'Sea Buckthorn Sugar';
const PLACE = 'Lantern yard hatch';

/** A small JPEG made here, as a phone camera would send one. */
async function photoFile() {
  const buffer = await sharp({ create: { width: 800, height: 600, channels: 3, background: { r: 232, g: 142, b: 40 } } }).jpeg({ quality: 80 }).toBuffer();
  return { name: 'sea-buckthorn.jpg', mimeType: 'image/jpeg', buffer };
}

async function signInStaff(page: Page, email: string) {
  await page.goto(`${appUrl}/staff/`);
  await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
  await chooseAccount(page, email);
  await page.getByRole('button', { name: /sign out/i }).first().waitFor();
}

/** "$1,234.50" → 123450 */
const cents = (text: string) => Math.round(Number(/\$([\d,]+\.\d\d)/.exec(text)![1]!.replace(/,/g, '')) * 100);

/** The "Gross sales" figure for this week, as the sales page shows it. */
async function grossOnPage(page: Page): Promise<number> {
  const money = page.getByRole('table', { name: /money this week and the week before/i });
  const row = money.getByRole('row', { name: /^gross sales/i });
  await row.waitFor();
  return cents((await row.getByRole('cell').filter({ hasText: '$' }).first().textContent()) ?? '');
}

describe('from a new menu item to the week’s sales', () => {
  it('the owner adds an item with a photo and a bake day; a customer pays for a dozen of it; the counter hands it over; the sales page and its CSV count it', async () => {
    // the owner: a new menu item with its photo
    const owner = (await browser.fresh()).page;
    await signInStaff(owner, 'owner@fryline.test');
    await owner.getByRole('heading', { name: /Owner — overview/ }).waitFor();

    // this week's gross before anything here is paid
    await owner.getByRole('link', { name: /^sales$/i }).first().click();
    await owner.getByRole('heading', { name: /^sales$/i, level: 1 }).waitFor();
    const grossBefore = await grossOnPage(owner);

    await owner.getByRole('link', { name: /^menu$/i }).first().click();
    await owner.getByRole('link', { name: /add an item/i }).click();
    const form = owner.getByRole('form', { name: /new menu item/i });
    await form.getByLabel(/^name$/i).fill(ITEM);
    await form.getByLabel(/^flavour/i).fill('Sea buckthorn');
    await form.getByLabel(/^glaze recipe/i).selectOption({ label: 'Vanilla glaze' });
    await form.getByLabel(/^extra charge/i).fill('0.50');
    await form.getByLabel(/^short description/i).fill('Tart orange berries in a vanilla sugar glaze.');
    await form.getByLabel(/choose a photo/i).setInputFiles(await photoFile());
    await form.getByRole('img', { name: new RegExp(`new photo for ${ITEM}`, 'i') }).waitFor();
    await form.getByRole('button', { name: /add to the menu/i }).click();
    await owner.getByText(`${ITEM} is saved with its photo.`).waitFor();
    await owner.getByRole('article', { name: ITEM }).getByRole('img', { name: new RegExp(`photo of ${ITEM}`, 'i') }).waitFor();

    // a bake day that offers it (every item on the menu is ticked when announcing)
    await owner.getByRole('link', { name: /^bake days$/i }).first().click();
    await owner.getByRole('link', { name: /announce a bake day/i }).click();
    const when = owner.getByRole('group', { name: /when and where/i });
    await when.getByLabel(/^date$/i).fill(DateTime.now().setZone('America/Denver').plus({ days: 9 }).toISODate()!);
    await when.getByLabel(/^time zone$/i).selectOption('America/Denver');
    await when.getByLabel(/^place$/i).fill(PLACE);
    await owner.getByRole('button', { name: /publish bake day/i }).click();
    await owner.getByText(new RegExp(`Announced .* at ${PLACE}`)).waitFor();

    // a customer: a dozen of the new item, paid with the test card that succeeds
    const customer = (await browser.fresh()).page;
    await customer.goto(`${appUrl}/`);
    await customer.getByRole('link', { name: /^sign in$/i }).or(customer.getByRole('button', { name: /^sign in$/i })).first().click();
    await chooseAccount(customer, 'lantern.customer@example.test');
    await customer.getByRole('heading', { name: /upcoming bake days/i }).waitFor();
    const days = (await (await customer.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ id: string; place: string }>;
    const day = days.find((d) => d.place === PLACE)!;
    expect(day).toBeDefined();
    await customer.goto(`${appUrl}/days/${day.id}`);
    await customer.getByRole('group', { name: /choose a pickup window/i }).getByRole('radio').first().check();
    await customer.getByRole('button', { name: /a dozen/i }).click();
    await customer.getByRole('img', { name: `${ITEM}, photographed` }).first().waitFor();
    for (let i = 0; i < 2; i += 1) await customer.getByRole('button', { name: `One more ${ITEM}` }).first().click();
    await customer.getByLabel(/fill the other 10 with/i).selectOption({ label: ITEM });
    await customer.getByRole('button', { name: /^fill$/i }).click();
    await customer.getByText(/12 of 12/).waitFor();
    await customer.getByRole('button', { name: /review order/i }).click();
    await customer.getByRole('checkbox', { name: /i have read the allergens/i }).check();
    const payButton = customer.getByRole('button', { name: /^pay \$/i });
    const total = cents((await payButton.textContent()) ?? '');
    await payButton.click();
    await customer.waitForURL((url) => url.href.startsWith(paymentsUrl));
    await payWithTestCard(customer, customer.url());
    const orderId = new URL(customer.url()).pathname.split('/').at(-1)!;
    const order = (await (await customer.request.get(`${appUrl}/api/orders/${orderId}`)).json()) as { pickupCode: string; status: string; totalCents: number };
    expect(order.status).toBe('paid');
    expect(order.totalCents).toBe(total);

    // the counter: the order on that day's pickup list, handed over
    const counter = (await browser.fresh()).page;
    await signInStaff(counter, 'counter@fryline.test');
    await counter.getByRole('link', { name: 'Pickups' }).first().click();
    await counter.getByRole('heading', { name: /^Pickups/ }).waitFor();
    const dayPicker = counter.getByRole('combobox', { name: /bake day/i });
    await dayPicker.selectOption((await dayPicker.getByRole('option', { name: new RegExp(PLACE) }).getAttribute('value'))!);
    const card = counter.getByRole('article').filter({ has: counter.getByLabel(`Pickup code ${order.pickupCode.split('').join(' ')}`) });
    await card.getByRole('button', { name: 'Hand over' }).click();
    await expect.poll(async () => card.getByTestId('pickup-status').textContent()).toMatch(/^Handed over/);
    // reached the server, not only this phone: the customer's order says so
    await expect
      .poll(async () => ((await (await customer.request.get(`${appUrl}/api/orders/${orderId}`)).json()) as { status: string }).status, { timeout: 20_000 })
      .toBe('collected');

    // the owner: this week's sales count the dozen and its money
    await owner.getByRole('link', { name: /^sales$/i }).first().click();
    await owner.getByRole('heading', { name: /^sales$/i, level: 1 }).waitFor();
    await owner.getByText(/^.+ to .+\(America\/Denver\)\.$/).waitFor();
    await owner.reload();
    const items = owner.getByRole('table', { name: /pieces sold by menu item/i });
    const itemRow = items.getByRole('row', { name: new RegExp(`^${ITEM}`) });
    await expect.poll(async () => itemRow.getByRole('cell').last().textContent()).toBe('12');
    const grossAfter = await grossOnPage(owner);
    expect(grossAfter - grossBefore).toBe(total);

    const [download] = await Promise.all([owner.waitForEvent('download'), owner.getByRole('link', { name: /download csv/i }).click()]);
    expect(download.suggestedFilename()).toMatch(/^sales-week-\d{4}-\d{2}-\d{2}\.csv$/);
    const chunks: Buffer[] = [];
    for await (const chunk of await download.createReadStream()) chunks.push(chunk as Buffer);
    const rows = parse(Buffer.concat(chunks).toString('utf8'), { columns: true });
    const row = (section: string, name: string) => rows.find((r) => r.section === section && r.name === name);
    expect(Number(row('summary', 'gross_cents')?.this_week)).toBe(grossAfter);
    expect(Number(row('item', ITEM)?.this_week)).toBe(12);
  });
});
