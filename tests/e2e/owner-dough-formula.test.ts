import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser({ width: 1024, height: 1300 });
});
afterAll(async () => browser.close());

type Settings = { dough: { variations: Array<{ name: string; flavours: string[]; addIns?: unknown[]; formula?: { ingredients: Array<{ name: string; percent: number; kind: string }> } }> } };

describe('the owner gives a flavour a dough of its own formula', () => {
  it('a formula whose flour is off is refused beside its lines and saves nothing; a right one is saved', async () => {
    const { page } = browser;
    const stored = async () => ((await (await page.request.get(`${appUrl}/api/production/settings`)).json()) as Settings).dough.variations;
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'owner@fryline.test');
    await page.getByRole('heading', { name: /Owner — overview/ }).waitFor();
    await page.goto(`${appUrl}/staff/equipment`);
    const doughs = page.getByRole('group', { name: /^flavoured doughs$/i });
    await doughs.waitFor();
    const before = await stored();

    await doughs.getByRole('button', { name: /add a flavoured dough/i }).click();
    const dough = doughs.getByRole('listitem').last();
    await dough.getByLabel(/^dough name$/i).fill('Honey test dough');
    await dough.getByLabel(/^menu flavours/i).fill('Honey test');
    await dough.getByRole('radio', { name: /a formula of its own/i }).check();
    // A copy of the current formula version: its first line is the flour, at 100 %.
    await expect.poll(() => dough.getByLabel(/line 1: name$/i).inputValue()).toMatch(/flour/i);
    await dough.getByLabel(/line 1: baker’s percentage$/i).fill('90');
    await page.getByRole('button', { name: /^save settings$/i }).click();
    await dough.getByRole('alert').filter({ hasText: /flour lines must add up to 100/i }).waitFor();
    expect(await stored()).toEqual(before);

    await dough.getByLabel(/line 1: baker’s percentage$/i).fill('100');
    await dough.getByLabel(/line 2: baker’s percentage$/i).fill('14');
    await page.getByRole('button', { name: /^save settings$/i }).click();
    await page.getByRole('status').filter({ hasText: /^Saved\./ }).waitFor();
    const saved = (await stored()).find((v) => v.name === 'Honey test dough')!;
    expect(saved.flavours).toEqual(['Honey test']);
    expect(saved.addIns).toBeUndefined();
    expect(saved.formula!.ingredients[0]!.percent).toBe(100);
    expect(saved.formula!.ingredients[1]!.percent).toBe(14);

    // and it goes again, leaving the settings as they were for the other journeys
    await dough.getByRole('button', { name: /remove honey test dough/i }).click();
    await page.getByRole('button', { name: /^save settings$/i }).click();
    await expect.poll(async () => (await stored()).map((v) => v.name)).toEqual(before.map((v) => v.name));
  });
});
