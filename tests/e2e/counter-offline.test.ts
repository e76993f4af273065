import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Page } from 'playwright-core';
import { connectDatabase, database } from '@fryline/api/db';
import { removeCounterDay, seedCounterDay, type SeededCounterDay } from '@fryline/seeds';
import { openBrowser, chooseAccount } from '../support/browser.js';

const { appUrl } = inject('stack');
let browser: Awaited<ReturnType<typeof openBrowser>>;
let seeded: SeededCounterDay;

beforeAll(async () => {
  connectDatabase(process.env.TEST_E2E_DATABASE_URL!, { poolMax: 2 });
  seeded = await seedCounterDay(new Date());
  browser = await openBrowser({ width: 390, height: 844 });
});
afterAll(async () => {
  await browser.close();
  await removeCounterDay(seeded.day.id);
});

const sql = async <T>(query: string, replacements: Record<string, unknown>) => (await database().query(query, { replacements }))[0] as T[];

async function openCounter(page: Page, email: string) {
  await page.goto(`${appUrl}/staff/pickups`);
  await page.getByRole('link', { name: /sign in/i }).or(page.getByRole('button', { name: /sign in/i })).first().click();
  await chooseAccount(page, email);
  await page.getByRole('link', { name: 'Pickups' }).first().click();
  await page.getByRole('heading', { name: /^Pickups · / }).waitFor();
  await page.getByRole('article', { name: 'Ada Quillfeather' }).waitFor();
}

const card = (page: Page, name: string) => page.getByRole('article', { name });

describe('the counter keeps working through a dead connection', () => {
  it('two hand-overs and a walk-up made offline survive a reload and reach the server once each; a hand-over made meanwhile elsewhere is reported', async () => {
    const { page, context } = browser;
    await openCounter(page, 'counter@fryline.test');
    // the app shell is kept by the service worker before the signal goes
    // (installed in the background on the first visit; a page opened before it was ready is looked after from its next load)
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
    if (!(await page.evaluate(() => navigator.serviceWorker.controller !== null))) await page.reload();
    await page.waitForFunction(() => navigator.serviceWorker?.controller !== null, undefined, { timeout: 30_000 });
    await card(page, 'Ada Quillfeather').waitFor();
    // the window under way is listed first, with its totals
    await expect.poll(async () => page.getByRole('heading', { level: 2 }).first().textContent()).toMatch(/Now/);
    await expect.poll(async () => page.getByTestId('window-totals').first().textContent()).toMatch(/^3 to hand over · 0 handed over/);
    if (process.env.SCREENSHOT_DIR) await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/counter-pickups.png`, fullPage: true });
    // the surplus is loaded once while online
    await page.getByRole('button', { name: 'Walk-up sale' }).click();
    await page.getByRole('button', { name: /one more vanilla bean glaze/i }).waitFor();
    await page.getByRole('button', { name: 'Pickups' }).click();

    await context.setOffline(true);
    await page.getByText(/no connection/i).first().waitFor();
    for (const name of ['Ada Quillfeather', 'Bram Ellery']) {
      await card(page, name).getByRole('button', { name: 'Hand over' }).click();
      await expect.poll(async () => card(page, name).getByTestId('pickup-status').textContent()).toMatch(/^Handed over .* by Priya Halloway/);
      await card(page, name).getByText('Waiting to send').waitFor();
    }
    await page.getByRole('button', { name: 'Walk-up sale' }).click();
    await page.getByRole('button', { name: /one more vanilla bean glaze/i }).click();
    await page.getByRole('radio', { name: 'Cash' }).check({ force: true });
    await page.getByLabel(/amount taken/i).fill('3.50');
    await page.getByRole('button', { name: /^record sale/i }).click();
    await page.getByText(/sale kept on this phone/i).waitFor();
    await expect.poll(async () => page.getByTestId('waiting-count').textContent()).toMatch(/3 waiting to send/);

    // meanwhile, the baker hands Ada's order over from another phone that has signal
    const other = await browser.fresh();
    await openCounter(other.page, 'baker@fryline.test');
    await card(other.page, 'Ada Quillfeather').getByRole('button', { name: 'Hand over' }).click();
    await expect.poll(async () => card(other.page, 'Ada Quillfeather').getByTestId('pickup-status').textContent()).toMatch(/by Tobias Wrenfield/);
    await expect.poll(async () => (await sql<{ status: string }>('SELECT status FROM orders WHERE id = :id', { id: seeded.orders[2]!.id }))[0]!.status).toBe('collected');

    // the first phone is reloaded with no signal: the list and the three waiting changes are still there
    await page.reload();
    await page.getByRole('button', { name: 'Pickups' }).click();
    await card(page, 'Bram Ellery').getByText('Waiting to send').waitFor();
    await expect.poll(async () => page.getByTestId('waiting-count').textContent()).toMatch(/3 waiting to send/);
    await card(page, 'Cleo Marchetti').getByRole('button', { name: 'Hand over' }).waitFor();

    // signal again: everything goes out, once
    await context.setOffline(false);
    await page.getByTestId('waiting-count').waitFor({ state: 'detached', timeout: 30_000 });
    const conflict = page.getByTestId('conflict');
    await conflict.first().waitFor();
    expect(await conflict.count()).toBe(1);
    await expect.poll(async () => conflict.first().textContent()).toMatch(/Hand over Ada Quillfeather.*Already handed over at .* by Tobias Wrenfield/);

    const ids = { ada: seeded.orders[2]!.id, bram: seeded.orders[3]!.id };
    const audit = await sql<{ subject_id: string; action: string; email: string }>(
      `SELECT a.subject_id, a.action, u.email FROM audit_log a JOIN users u ON u.id = a.actor_id
        WHERE a.subject_id IN (:ids) OR (a.action = 'walk_up.sold' AND a.details->>'bakeDayId' = :day) ORDER BY a.id`,
      { ids: [ids.ada, ids.bram], day: seeded.day.id },
    );
    expect(audit.filter((a) => a.subject_id === ids.bram)).toEqual([{ subject_id: ids.bram, action: 'order.collected', email: 'counter@fryline.test' }]);
    expect(audit.filter((a) => a.subject_id === ids.ada)).toEqual([{ subject_id: ids.ada, action: 'order.collected', email: 'baker@fryline.test' }]);
    expect(audit.filter((a) => a.action === 'walk_up.sold')).toHaveLength(1);
    const sales = await sql<{ method: string; amount_cents: number }>('SELECT method, amount_cents FROM walk_up_sales WHERE bake_day_id = :day', { day: seeded.day.id });
    expect(sales).toEqual([{ method: 'cash', amount_cents: 350 }]);

    // the counter person deals with it
    await conflict.getByRole('button', { name: 'Dealt with' }).click();
    await conflict.first().waitFor({ state: 'detached' });
    // the day's close shows the walk-up's cash to count
    await page.getByRole('button', { name: 'End of day' }).click();
    await expect.poll(async () => page.getByTestId('cash-to-count').textContent()).toBe('$3.50');
    if (process.env.SCREENSHOT_DIR) {
      await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/counter-end-of-day.png`, fullPage: true });
      await page.getByRole('button', { name: 'Walk-up sale' }).click();
      await page.getByRole('button', { name: /one more vanilla bean glaze/i }).waitFor();
      await page.screenshot({ path: `${process.env.SCREENSHOT_DIR}/counter-walk-up.png`, fullPage: true });
    }
    await other.context.close();
  });
});
