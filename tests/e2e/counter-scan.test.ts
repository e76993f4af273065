import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { openBrowser, chooseAccount, payWithTestCard } from '../support/browser.js';
import { pngToY4m } from '../support/y4m.js';

const { appUrl, mailUrl } = inject('stack');
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'fryline-scan-'));
const closers: Array<() => Promise<void>> = [];
afterAll(async () => {
  for (const close of closers) await close();
  fs.rmSync(dir, { recursive: true, force: true });
});

async function signInCounter(page: Page) {
  await page.goto(`${appUrl}/staff/`);
  await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
  await chooseAccount(page, 'counter@fryline.test');
  await page.getByRole('link', { name: 'Pickups' }).first().click();
  await page.getByRole('heading', { name: /^Pickups/ }).waitFor();
}

describe('scanning the pickup QR code with the camera', () => {
  it('a fake camera showing the QR code from the real confirmation e-mail opens that order; no camera is explained in one line', async () => {
    // a customer pays for a half dozen and gets the confirmation e-mail
    const shop = await openBrowser();
    closers.push(() => shop.close());
    const { page } = shop;
    const email = 'scan.customer@example.test';
    await page.goto(`${appUrl}/`);
    await page.getByRole('link', { name: /^sign in$/i }).or(page.getByRole('button', { name: /^sign in$/i })).first().click();
    await chooseAccount(page, email);
    await page.getByRole('heading', { name: /upcoming bake days/i }).waitFor();
    const days = (await (await page.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ id: string; status: string; pickupWindows: Array<{ id: string }>; menu: Array<{ id: string; kind: string }> }>;
    // the second open day: the journeys that count the next day's orders keep their figures
    const day = days.filter((d) => d.status === 'open')[1]!;
    const { token } = (await (await page.request.get(`${appUrl}/api/csrf`)).json()) as { token: string };
    const created = (await (
      await page.request.post(`${appUrl}/api/orders`, {
        headers: { 'x-csrf-token': token },
        data: { bakeDayId: day.id, pickupWindowId: day.pickupWindows[0]!.id, boxes: [{ size: 'half-dozen', items: [{ menuItemId: day.menu.find((m) => m.kind === 'ring')!.id, quantity: 6 }] }] },
      })
    ).json()) as { id: string; checkoutUrl: string };
    await payWithTestCard(page, created.checkoutUrl);

    let message: { id: string; subject: string } | undefined;
    await expect
      .poll(async () => {
        const list = (await (await fetch(`${mailUrl}/api/messages?to=${encodeURIComponent(email)}`)).json()) as Array<{ id: string; subject: string }>;
        message = list.find((m) => /pickup code/i.test(m.subject));
        return message !== undefined;
      }, { timeout: 30_000 })
      .toBe(true);
    const code = /pickup code ([A-Z0-9]{6})/.exec(message!.subject)![1]!;
    const detail = (await (await fetch(`${mailUrl}/api/messages/${message!.id}`)).json()) as { attachments: Array<{ contentType: string }> };
    const index = detail.attachments.findIndex((a) => a.contentType === 'image/png');
    expect(index).toBeGreaterThanOrEqual(0);
    const qrPng = Buffer.from(await (await fetch(`${mailUrl}/api/messages/${message!.id}/attachments/${index}`)).arrayBuffer());
    const video = path.join(dir, 'pickup-qr.y4m');
    fs.writeFileSync(video, pngToY4m(qrPng));

    // the counter's phone, its camera fed that frame
    const phone = await openBrowser({ width: 390, height: 844 }, ['--use-fake-device-for-media-stream', `--use-file-for-fake-video-capture=${video}`, '--use-fake-ui-for-media-stream']);
    closers.push(() => phone.close());
    await phone.context.grantPermissions(['camera'], { origin: appUrl });
    await signInCounter(phone.page);
    await phone.page.getByRole('button', { name: 'Scan QR' }).click();
    const found = phone.page.getByRole('dialog');
    await found.waitFor({ timeout: 30_000 });
    // the order it opens: the customer's name, the code and what is in the box; it is for another day than the one on screen
    await expect.poll(async () => found.getByRole('heading').first().textContent(), { timeout: 20_000 }).toMatch(/Scan Customer|scan\.customer/i);
    expect(await found.textContent()).toContain(code);
    expect(await found.textContent()).toMatch(/half dozen: 6 /i);
    expect(await found.textContent()).toMatch(/This order is for .*not this bake day/);

    // a browser with no camera at all says so in one line, and the typed code still works
    const plain = await openBrowser();
    closers.push(() => plain.close());
    await signInCounter(plain.page);
    await plain.page.getByRole('button', { name: 'Scan QR' }).click();
    await plain.page.getByRole('alert').filter({ hasText: /camera/i }).waitFor();
    expect(await plain.page.getByRole('alert').filter({ hasText: /camera/i }).textContent()).toMatch(/^(No camera found|The camera (is blocked|could not start)|This browser gives)[^\n]*type the code/);
    await plain.page.getByRole('searchbox').fill(code.toLowerCase());
    await plain.page.getByRole('searchbox').press('Enter');
    await plain.page.getByRole('dialog').filter({ hasText: /half dozen: 6 /i }).waitFor();
  });
});
