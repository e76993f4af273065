import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DateTime } from 'luxon';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser({ width: 1024, height: 1300 });
});
afterAll(async () => browser.close());

describe('the owner announces a bake day and adds a helper', () => {
  it('the new day shows in the shop, and the helper signs in as counter', async () => {
    let { page } = browser;
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'owner@fryline.test');
    await page.getByRole('heading', { name: /Owner — overview/ }).waitFor();

    await page.getByRole('link', { name: /^bake days$/i }).first().click();
    await page.getByRole('link', { name: /announce a bake day/i }).click();
    await page.getByRole('heading', { name: /announce a bake day/i }).waitFor();
    const date = DateTime.now().setZone('America/Denver').plus({ days: 12 }).toISODate()!;
    const when = page.getByRole('group', { name: /when and where/i });
    await when.getByLabel(/^date$/i).fill(date);
    await when.getByLabel(/^time zone$/i).selectOption('America/Denver');
    await when.getByLabel(/^place$/i).fill('Granary courtyard');
    await when.getByLabel(/^address/i).fill('9 Mill Row');
    await page.getByRole('button', { name: /publish bake day/i }).click();
    await page.getByText(/Announced .* at Granary courtyard\. Pre-orders are open now/).waitFor();

    const listed = (await (await page.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ date: string; place: string; status: string }>;
    expect(listed.find((d) => d.place === 'Granary courtyard')).toMatchObject({ date, status: 'open' });

    // a new helper on the counter
    await page.getByRole('link', { name: /^staff$/i }).first().click();
    const add = page.getByRole('form', { name: /add someone/i });
    await add.getByLabel(/^e-mail$/i).fill('stall.helper@example.test');
    await add.getByLabel(/^name/i).fill('Stall Helper');
    await add.getByLabel(/^role$/i).selectOption({ label: 'Counter' });
    await add.getByRole('button', { name: /add to the staff/i }).click();
    await page.getByRole('article', { name: /stall helper/i }).or(page.getByText('Stall Helper')).first().waitFor();

    ({ page } = await browser.fresh()); // a new person: their own cookies
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'stall.helper@example.test');
    await page.getByRole('heading', { name: /Counter — pickups/ }).waitFor();

    // and the shop shows the new day to customers
    await page.goto(`${appUrl}/`);
    await page.getByText('Granary courtyard').first().waitFor();
  });

  it('a draft stays out of the shop until the owner publishes it from Drafts', async () => {
    const { page } = await browser.fresh();
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'owner@fryline.test');
    await page.getByRole('heading', { name: /Owner — overview/ }).waitFor();
    await page.goto(`${appUrl}/staff/bake-days/new`);
    const date = DateTime.now().setZone('America/Denver').plus({ days: 15 }).toISODate()!;
    const when = page.getByRole('group', { name: /when and where/i });
    await when.getByLabel(/^date$/i).fill(date);
    await when.getByLabel(/^time zone$/i).selectOption('America/Denver');
    await when.getByLabel(/^place$/i).fill('Quiet orchard gate');
    await page.getByRole('button', { name: /save as draft/i }).click();
    await page.getByText(/as a draft\. Customers do not see it\./).waitFor();
    const shopPlaces = async () => ((await (await page.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ place: string }>).map((d) => d.place);
    expect(await shopPlaces()).not.toContain('Quiet orchard gate');
    const drafts = page.getByRole('region', { name: /^drafts$/i });
    await drafts.getByRole('button', { name: /^publish/i }).first().click();
    await expect.poll(shopPlaces).toContain('Quiet orchard gate');
  });
});
