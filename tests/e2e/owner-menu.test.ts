import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { DateTime } from 'luxon';
import sharp from 'sharp';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;

beforeAll(async () => {
  browser = await openBrowser({ width: 1024, height: 1300 });
});
afterAll(async () => browser.close());

/** A 1600 × 1200 JPEG with a camera make in its EXIF, as a phone would send. */
async function photoFile() {
  const buffer = await sharp({ create: { width: 1600, height: 1200, channels: 3, background: { r: 190, g: 96, b: 120 } } })
    .jpeg({ quality: 85 })
    .withExif({ IFD0: { Make: 'Pocketcam' } })
    .toBuffer();
  return { name: 'rhubarb.jpg', mimeType: 'image/jpeg', buffer };
}

describe('the owner adds a menu item with a photo', () => {
  it('it appears with its photo in the shop once a bake day offers it', async () => {
    let { page } = browser;
    await page.goto(`${appUrl}/staff/`);
    await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
    await chooseAccount(page, 'owner@fryline.test');
    await page.getByRole('heading', { name: /Owner — overview/ }).waitFor();

    await page.getByRole('link', { name: /^menu$/i }).first().click();
    await page.getByRole('link', { name: /add an item/i }).click();
    const form = page.getByRole('form', { name: /new menu item/i });
    await form.getByLabel(/^name$/i).fill('Rhubarb Crumble');
    await form.getByLabel(/^flavour/i).fill('Rhubarb');
    await form.getByLabel(/^glaze recipe/i).selectOption({ label: 'Vanilla glaze' });
    // the glaze recipe's own allergen (milk) is ticked with it; add tree nuts for the crumble
    await expect.poll(() => form.getByRole('checkbox', { name: 'milk' }).isChecked()).toBe(true);
    await form.getByRole('checkbox', { name: 'tree nuts' }).check();
    await form.getByLabel(/^extra charge/i).fill('0.75');
    await form.getByLabel(/^short description/i).fill('Stewed rhubarb glaze and an oat crumble.');
    await form.getByLabel(/choose a photo/i).setInputFiles(await photoFile());
    await form.getByRole('img', { name: /new photo for rhubarb crumble/i }).waitFor();
    await form.getByRole('button', { name: /add to the menu/i }).click();

    await page.getByText('Rhubarb Crumble is saved with its photo.').waitFor();
    const card = page.getByRole('article', { name: 'Rhubarb Crumble' });
    await card.getByRole('img', { name: /photo of rhubarb crumble/i }).waitFor();
    await card.getByText('+$0.75 each').waitFor();

    // a bake day that offers it (every item on the menu is ticked when announcing)
    await page.getByRole('link', { name: /^bake days$/i }).first().click();
    await page.getByRole('link', { name: /announce a bake day/i }).click();
    const date = DateTime.now().setZone('America/Denver').plus({ days: 20 }).toISODate()!;
    const when = page.getByRole('group', { name: /when and where/i });
    await when.getByLabel(/^date$/i).fill(date);
    await when.getByLabel(/^time zone$/i).selectOption('America/Denver');
    await when.getByLabel(/^place$/i).fill('Rhubarb lane stall');
    await page.getByRole('button', { name: /publish bake day/i }).click();
    await page.getByText(/Announced .* at Rhubarb lane stall/).waitFor();
    const days = (await (await page.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ id: string; place: string }>;
    const day = days.find((d) => d.place === 'Rhubarb lane stall')!;

    // a customer's view of that day: the item with its photo, sized before it loads, lazy
    ({ page } = await browser.fresh());
    await page.goto(`${appUrl}/days/${day.id}`);
    await page.getByRole('button', { name: /a dozen/i }).click();
    const img = page.getByRole('img', { name: 'Rhubarb Crumble, photographed' }).first();
    await img.scrollIntoViewIfNeeded();
    await expect.poll(() => img.evaluate((el: HTMLImageElement) => el.complete && el.naturalWidth > 0)).toBe(true);
    expect(await img.getAttribute('loading')).toBe('lazy');
    expect(await img.getAttribute('width')).toBe('1280');
    expect(await img.getAttribute('height')).toBe('960');
    expect(await img.getAttribute('srcset')).toMatch(/^\/api\/photos\/[0-9a-f]{32}\.webp 320w, \/api\/photos\/[0-9a-f]{32}\.webp 640w, \/api\/photos\/[0-9a-f]{32}\.webp 1280w$/);
    expect(await img.getAttribute('sizes')).toBeTruthy();
    await page.getByText(/tree nuts/).first().waitFor();
    // the file the browser chose is served for a year, unchanged
    const src = await img.evaluate((el: HTMLImageElement) => el.currentSrc);
    const res = await page.request.get(src);
    expect(res.headers()['cache-control']).toBe('public, max-age=31536000, immutable');
  });
});
