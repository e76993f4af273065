import { mkdirSync, readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { PDFDocument } from 'pdf-lib';
import pg from 'pg';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { chooseAccount, openBrowser } from '../support/browser.js';

/**
 * Every screen below is checked with axe-core (Deque's rules engine) for
 * WCAG 2.0/2.1 A and AA, and photographed at a phone and a desktop width
 * into test-results/screens/ (git-ignored) so a person can look at them
 * after any change. To add a screen, add one line to `screens`.
 */

const { appUrl } = inject('stack');
// evaluated through the browser's DevTools protocol, which the apps' Content-Security-Policy doesn't block
const axeSource = readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const shotsDir = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../test-results/screens');
const widths = { phone: { width: 390, height: 844 }, desktop: { width: 1280, height: 900 } } as const;

type Who = 'customer' | 'counter' | 'baker' | 'owner';
interface Fixture {
  openDayId: string;
  soldOutDayId: string;
  paidOrderId: string;
}
interface Screen {
  name: string;
  who: Who;
  /** The page's address (shop paths from /, staff paths from /staff/). */
  path: (f: Fixture) => string;
  /** What shows once the page is ready. */
  ready: RegExp;
  /** Steps after loading, before the check (for screens reached by using a page). */
  then?: (page: Page) => Promise<void>;
}

export const screens: Screen[] = [
  { name: 'shop-home', who: 'customer', path: () => '/', ready: /upcoming bake days/i },
  { name: 'box-builder', who: 'customer', path: (f) => `/days/${f.openDayId}`, ready: /choose a pickup window/i },
  { name: 'order-review', who: 'customer', path: (f) => `/days/${f.openDayId}`, ready: /choose a pickup window|what you pay/i, then: fillAndReview },
  { name: 'order-page', who: 'customer', path: (f) => `/orders/${f.paidOrderId}`, ready: /your pickup code/i },
  { name: 'my-orders', who: 'customer', path: () => '/orders', ready: /my orders|your orders/i },
  { name: 'waitlist', who: 'customer', path: (f) => `/days/${f.soldOutDayId}`, ready: /waitlist/i },
  { name: 'formula-editor', who: 'baker', path: () => '/staff/formula', ready: /formula/i },
  { name: 'staff-order-list', who: 'owner', path: (f) => `/staff/bake-days/${f.openDayId}`, ready: /^orders for /i },
  { name: 'pickup-list', who: 'counter', path: (f) => `/staff/pickups?day=${f.openDayId}`, ready: /^pickups · /i, then: shown('window-totals') },
  { name: 'walk-up-sale', who: 'counter', path: (f) => `/staff/pickups?day=${f.openDayId}&view=walk-up`, ready: /^paid by$/i },
  { name: 'end-of-day', who: 'counter', path: (f) => `/staff/pickups?day=${f.openDayId}&view=end-of-day`, ready: /^cash to count in the box$/i },
  { name: 'menu-list', who: 'owner', path: () => '/staff/menu', ready: /^rings$/i },
  { name: 'menu-item-form', who: 'owner', path: () => '/staff/menu/new', ready: /^allergens$/i },
  { name: 'shop-settings', who: 'owner', path: () => '/staff/settings', ready: /^money and tax$/i },
  { name: 'payment-checks', who: 'owner', path: () => '/staff/payment-checks', ready: /^(no payment has failed its check|\d+ payments? that didn’t match)$/i },
  { name: 'audit-log', who: 'owner', path: () => '/staff/audit-log', ready: /^(no changes match|\d+ changes?)/i },
  { name: 'weekly-sales', who: 'owner', path: () => '/staff/sales', ready: /^walk-up sales$/i },
  { name: 'bake-day-edit', who: 'owner', path: (f) => `/staff/bake-days/${f.openDayId}/edit`, ready: /^change (?!a bake day)/i },
  { name: 'production-sheet', who: 'baker', path: (f) => `/staff/production?day=${f.openDayId}`, ready: /^production sheet — /i },
];

/** Waits for the first element with this test id (for screens whose heading shows before their data). */
function shown(testId: string) {
  return async (page: Page) => {
    await page.getByTestId(testId).first().waitFor();
  };
}

async function fillAndReview(page: Page) {
  // the half-built box is kept while the customer moves around: a second visit opens on the review
  if (await page.getByRole('heading', { name: /what you pay/i }).isVisible()) return;
  await page.getByRole('group', { name: /choose a pickup window/i }).getByRole('radio').first().check();
  await page.getByRole('button', { name: /a half dozen/i }).click();
  const select = page.getByLabel(/fill the other \d+ with/i);
  await select.selectOption({ index: 1 });
  await page.getByRole('button', { name: /^fill$/i }).click();
  await page.getByRole('button', { name: /review order/i }).click();
  await page.getByRole('heading', { name: /what you pay/i }).waitFor();
}

interface AxeResult {
  violations: Array<{ id: string; impact: string | null; help: string; nodes: Array<{ target: unknown[] }> }>;
}

/** axe-core injected into the page; serious and critical WCAG 2.1 A/AA violations, as readable lines. */
async function axeProblems(page: Page): Promise<string[]> {
  await page.evaluate(axeSource);
  const result = (await page.evaluate(() =>
    (window as unknown as { axe: { run(ctx: unknown, opts: unknown): Promise<unknown> } }).axe.run(document, {
      runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] },
    }),
  )) as AxeResult;
  return result.violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id} (${v.impact}): ${v.help} — ${v.nodes.map((n) => JSON.stringify(n.target)).join(', ')}`);
}

/** Presses Tab until `target` has the focus (keyboard only), checking that the focus can be seen. */
async function tabTo(page: Page, target: ReturnType<Page['getByRole']>, maxTabs = 120) {
  for (let i = 0; i < maxTabs; i += 1) {
    if (await target.evaluate((el) => el === document.activeElement).catch(() => false)) {
      // the ring may sit on the control or on the label or box that wraps it
      const visible = await target.evaluate((el) =>
        [el, el.closest('label'), el.parentElement].some((node) => {
          if (!node) return false;
          const style = getComputedStyle(node);
          return (style.outlineStyle !== 'none' && parseFloat(style.outlineWidth) > 0) || style.boxShadow !== 'none';
        }),
      );
      expect(visible, 'the focused control shows a focus ring').toBe(true);
      return;
    }
    await page.keyboard.press('Tab');
  }
  throw new Error(`Tab never reached ${target.toString()}`);
}

/**
 * The page as printed fits one sheet (or `atMost` sheets) of US Letter (8.5 × 11 in = 612 × 792 pt, ANSI/ASME Y14.1) and one of
 * A4 (210 × 297 mm, ISO 216), counted by pdf-lib, which reads the file's page tree; and no printed text is
 * under 9 pt (12 CSS px; CSS Values 4: 1 pt = 4/3 px), so it reads at arm's length. Call it in print media.
 */
async function expectOnePrintedPage(page: Page, name: string, atMost = 1) {
  // print with the sheet's own fonts: a fallback font, while one is still loading on a busy machine, sets wider
  await page.evaluate(async () => {
    await document.fonts.ready;
  });
  for (const [format, size] of [['Letter', [612, 792]], ['A4', [595.28, 841.89]]] as const) {
    const file = await page.pdf({ path: path.join(shotsDir, `${name}-${format.toLowerCase()}.pdf`), format, printBackground: true });
    const doc = await PDFDocument.load(file);
    if (atMost === 1) expect(doc.getPageCount(), `${name}, ${format}: the sheet fits one page`).toBe(1);
    else expect(doc.getPageCount(), `${name}, ${format}: the sheet fits ${atMost} pages`).toBeLessThanOrEqual(atMost);
    // Chromium sizes pages in whole CSS pixels (0.75 pt each), so allow a pixel and a half.
    const { width, height } = doc.getPage(0).getSize();
    expect(Math.abs(width - size[0]), `${format}: page width ${width} pt`).toBeLessThanOrEqual(1.2);
    expect(Math.abs(height - size[1]), `${format}: page height ${height} pt`).toBeLessThanOrEqual(1.2);
  }
  const small = await page.locator('main').evaluate((main) => {
    const tooSmall: string[] = [];
    const walker = document.createTreeWalker(main, NodeFilter.SHOW_TEXT);
    for (let node = walker.nextNode(); node; node = walker.nextNode()) {
      const el = node.parentElement;
      if (!el || !node.textContent?.trim() || el.closest('.sr-only')) continue;
      const box = el.getBoundingClientRect();
      if (box.width === 0 || box.height === 0 || getComputedStyle(el).visibility === 'hidden') continue;
      const px = parseFloat(getComputedStyle(el).fontSize);
      if (px < 12 - 0.01) tooSmall.push(`${px * 0.75} pt: ${node.textContent.trim().slice(0, 40)}`);
    }
    return tooSmall;
  });
  expect(small, `${name}: printed text of at least 9 pt`).toEqual([]);
}

let browser: Awaited<ReturnType<typeof openBrowser>>;
const pages = new Map<Who, Page>();
let fixture: Fixture;
let db: pg.Client;
let restoreHoles: number | null = null;

async function signedIn(who: Who): Promise<Page> {
  const known = pages.get(who);
  if (known) return known;
  const page = await signInFresh(who === 'customer' ? 'screens.customer@example.test' : `${who}@fryline.test`, who !== 'customer');
  pages.set(who, page);
  return page;
}

/** A new browser context signed in with this account, in the shop or in the staff app. */
async function signInFresh(email: string, staff: boolean): Promise<Page> {
  const { page } = await browser.fresh();
  await page.goto(staff ? `${appUrl}/staff/` : `${appUrl}/`);
  const signIn = staff ? /sign in/i : /^sign in$/i;
  await page.getByRole('link', { name: signIn }).or(page.getByRole('button', { name: signIn })).first().click();
  await chooseAccount(page, email);
  // the sign-in redirects can outlast a quiet network: wait until the staff app shows who is signed in
  if (staff) await page.getByRole('button', { name: /sign out/i }).waitFor();
  await page.waitForLoadState('networkidle');
  return page;
}

beforeAll(async () => {
  browser = await openBrowser();
  mkdirSync(shotsDir, { recursive: true });
  const page = await signedIn('customer');
  const days = (await (await page.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ id: string; status: string; pickupWindows: Array<{ id: string }>; menu: Array<{ id: string; kind: string }> }>;
  const open = days.filter((d) => d.status === 'open');
  const day = open[0]!;
  // a paid order of our own, paid on the payments stand-in's page
  const ring = day.menu.find((m) => m.kind === 'ring')!;
  const { token } = (await (await page.request.get(`${appUrl}/api/csrf`)).json()) as { token: string };
  const created = (await (
    await page.request.post(`${appUrl}/api/orders`, {
      headers: { 'x-csrf-token': token },
      data: { bakeDayId: day.id, pickupWindowId: day.pickupWindows[0]!.id, boxes: [{ size: 'half-dozen', items: [{ menuItemId: ring.id, quantity: 6 }] }] },
    })
  ).json()) as { id: string; checkoutUrl: string };
  await page.goto(created.checkoutUrl);
  await page.getByLabel(/card number/i).fill('4242 4242 4242 4242');
  await page.getByLabel(/expiry/i).fill('12/34');
  await page.getByLabel(/security code/i).fill('123');
  await page.getByRole('button', { name: /^pay/i }).click();
  await page.getByText(/your pickup code/i).waitFor({ timeout: 30_000 });
  // the last open day's holes sold out, so its page shows the waitlist (put back afterwards)
  const soldOut = open.at(-1)!;
  db = new pg.Client({ connectionString: process.env.TEST_E2E_DATABASE_URL });
  await db.connect();
  const before = await db.query<{ holes_remaining: number }>('SELECT holes_remaining FROM bake_days WHERE id = $1', [soldOut.id]);
  restoreHoles = before.rows[0]!.holes_remaining;
  await db.query('UPDATE bake_days SET holes_remaining = 0 WHERE id = $1', [soldOut.id]);
  fixture = { openDayId: day.id, soldOutDayId: soldOut.id, paidOrderId: created.id };
});

afterAll(async () => {
  if (db) {
    if (restoreHoles !== null) await db.query('UPDATE bake_days SET holes_remaining = $1 WHERE id = $2', [restoreHoles, fixture.soldOutDayId]);
    await db.end();
  }
  await browser?.close();
});

describe('every screen: no serious or critical WCAG 2.1 AA violation (axe-core), photographed at phone and desktop widths', () => {
  for (const screen of screens) {
    it(screen.name, async () => {
      const page = await signedIn(screen.who);
      for (const [width, viewport] of Object.entries(widths)) {
        await page.setViewportSize(viewport);
        await page.goto(`${appUrl}${screen.path(fixture)}`);
        await page.getByRole('heading', { name: screen.ready }).or(page.getByRole('group', { name: screen.ready })).first().waitFor();
        if (screen.then) await screen.then(page);
        await page.waitForLoadState('networkidle');
        await page.screenshot({ path: path.join(shotsDir, `${screen.name}-${width}.png`), fullPage: true });
        expect(await axeProblems(page), `${screen.name} at ${width} width`).toEqual([]);
        // wherever a bill is shown, its lines add up to its total
        for (const bill of await page.getByTestId('price-lines').all()) {
          const cents = await bill.locator('[data-price-line]').evaluateAll((rows) => rows.map((r) => Number(r.getAttribute('data-cents'))));
          const total = Number(await bill.locator('[data-price-total]').getAttribute('data-price-total'));
          expect(cents.reduce((a, b) => a + b, 0), `${screen.name}: bill lines sum to the total`).toBe(total);
        }
      }
    });
  }
});

describe('printed production sheet', () => {
  it('prints without the page controls, saved as a PDF beside the screenshots', async () => {
    const page = await signedIn('baker');
    await page.setViewportSize(widths.desktop);
    await page.goto(`${appUrl}/staff/production?day=${fixture.openDayId}`);
    await page.getByRole('heading', { name: /^production sheet — /i }).waitFor();
    await page.waitForLoadState('networkidle');
    const print = page.getByRole('button', { name: /^print$/i });
    await expect.poll(() => print.isVisible()).toBe(true);
    await page.emulateMedia({ media: 'print' });
    try {
      await expect.poll(() => print.isVisible(), { message: 'the Print button is left off paper' }).toBe(false);
      const pdf = await page.pdf({ path: path.join(shotsDir, 'production-sheet.pdf'), printBackground: true });
      // every PDF file opens with the "%PDF-" header (ISO 32000-1, 7.5.2)
      expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
      // The printed layout as a picture too, at US Letter's printable width (8.5 in less the sheet's 2 × 6 mm margins, 96 px an inch).
      await page.setViewportSize({ width: Math.floor(8.5 * 96 - (2 * 6 * 96) / 25.4), height: 900 });
      await page.screenshot({ path: path.join(shotsDir, 'production-sheet-print.png'), fullPage: true });
      await expectOnePrintedPage(page, 'production-sheet');
      // The parts a baker works from are on paper: the schedule, the mixer list, the fry plan and its batches.
      for (const name of [/^schedule$/i, /^dough$/i, /^frying$/i, /^cutting$/i, /^proof and fry, batch by batch$/i]) {
        await expect.poll(() => page.getByRole('heading', { name }).first().isVisible(), { message: `${name} printed` }).toBe(true);
      }
      await expect.poll(() => page.getByText(/^into the mixer$/i).isVisible()).toBe(true);
    } finally {
      await page.emulateMedia({ media: null });
    }
  });

  it('a busy bake (8 dozen rings, 4 bags of holes, so several mixes and some 35 fry batches) prints every batch legibly, on at most two pages (one is the goal)', async () => {
    // A bake day of this test's own, five weeks out, set up by the owner after the other screens chose theirs.
    const owner = await signedIn('owner');
    const { token: ownerToken } = (await (await owner.request.get(`${appUrl}/api/csrf`)).json()) as { token: string };
    const menu = (await (await owner.request.get(`${appUrl}/api/staff/menu-items`)).json()) as Array<{ id: string; active: boolean }>;
    const created = await owner.request.post(`${appUrl}/api/staff/bake-days`, {
      headers: { 'x-csrf-token': ownerToken },
      data: {
        date: new Date(Date.now() + 35 * 86_400_000).toISOString().slice(0, 10),
        place: 'Orchard Lane school fair',
        timeZone: 'America/Denver',
        windows: [{ start: '08:00', end: '09:00' }, { start: '09:00', end: '10:00' }, { start: '10:00', end: '11:00' }],
        menuItemIds: menu.filter((m) => m.active).map((m) => m.id),
        boxes: [{ size: 'dozen', pieces: 12, priceCents: 3000 }, { size: 'holes', pieces: 12, priceCents: 800 }],
        ringCapacity: 120,
        holeCapacity: 60,
      },
    });
    expect(created.status(), await created.text()).toBe(201);
    const busyDayId = ((await created.json()) as { id: string }).id;
    // Four customers' held orders (each at the shop's 36-piece limit): 96 rings over every ring on the menu, 48 holes.
    const boxes = [
      ...Array.from({ length: 8 }, (_, i) => ({ size: 'dozen', ring: i })),
      ...Array.from({ length: 4 }, () => ({ size: 'holes', ring: -1 })),
    ];
    for (let n = 0; n < 4; n += 1) {
      const customer = await signInFresh(`busy.customer${n + 1}@example.test`, false);
      const days = (await (await customer.request.get(`${appUrl}/api/bake-days`)).json()) as Array<{ id: string; pickupWindows: Array<{ id: string }>; menu: Array<{ id: string; kind: string }> }>;
      const busy = days.find((d) => d.id === busyDayId)!;
      const rings = busy.menu.filter((m) => m.kind === 'ring');
      const hole = busy.menu.find((m) => m.kind === 'hole')!;
      const { token } = (await (await customer.request.get(`${appUrl}/api/csrf`)).json()) as { token: string };
      const order = await customer.request.post(`${appUrl}/api/orders`, {
        headers: { 'x-csrf-token': token },
        data: {
          bakeDayId: busyDayId,
          pickupWindowId: busy.pickupWindows[n % busy.pickupWindows.length]!.id,
          boxes: boxes.slice(n * 3, n * 3 + 3).map((box) => ({
            size: box.size,
            items: [{ menuItemId: box.ring < 0 ? hole.id : rings[box.ring % rings.length]!.id, quantity: 12 }],
          })),
        },
      });
      expect(order.status(), await order.text()).toBe(201);
      await customer.context().close();
    }

    const page = await signedIn('baker');
    await page.setViewportSize(widths.desktop);
    await page.goto(`${appUrl}/staff/production?day=${busyDayId}`);
    await page.getByText(/^Counts 4 orders/).waitFor();
    await page.waitForLoadState('networkidle');
    const batches = await page.getByRole('table').filter({ has: page.getByText(/^fry timetable$/i) }).getByRole('row').count();
    expect(batches - 1, 'fry batches in the timetable (less its heading row)').toBeGreaterThanOrEqual(30);
    await page.emulateMedia({ media: 'print' });
    try {
      await page.setViewportSize({ width: Math.floor(8.5 * 96 - (2 * 6 * 96) / 25.4), height: 900 });
      await page.screenshot({ path: path.join(shotsDir, 'production-sheet-busy-print.png'), fullPage: true });
      // One page is the goal; this busy bake still needs two (3 before the timetable went full width).
      await expectOnePrintedPage(page, 'production-sheet-busy', 2);
      // every batch still prints its number, clock time, pieces and the thermometer reading to wait for
      const printed = await page.getByRole('table').filter({ has: page.getByText(/^fry timetable$/i) }).locator('tbody tr').evaluateAll((rows) =>
        rows
          .filter((row) => row.getBoundingClientRect().height > 0)
          .map((row) => Array.from(row.children, (cell) => cell.textContent?.trim()).join(' ').replace(/\s+/g, ' ')),
      );
      expect(printed).toHaveLength(batches - 1);
      for (const line of printed) expect(line).toMatch(/^\d+ \d{1,2}:\d{2} [ap]m \d+ (ring|hole)s?.* \d+ °[CF]\b/);
    } finally {
      await page.emulateMedia({ media: null });
    }
  });
});

describe('keyboard only', () => {
  it('builds and pays for a box with the keyboard alone, the focus always visible', async () => {
    const page = await signedIn('customer');
    await page.setViewportSize(widths.desktop);
    await page.goto(`${appUrl}/days/${fixture.openDayId}`);
    // another day than the paid order's would need its own hold: use the sold-out-holes day, which still sells rings
    await page.goto(`${appUrl}/days/${fixture.soldOutDayId}`);
    const firstWindow = page.getByRole('group', { name: /choose a pickup window/i }).getByRole('radio').first();
    await tabTo(page, firstWindow);
    await page.keyboard.press('Space');
    await tabTo(page, page.getByRole('button', { name: /a half dozen/i }));
    await page.keyboard.press('Enter');
    const fill = page.getByLabel(/fill the other 6 with/i);
    await tabTo(page, fill);
    await page.keyboard.press('ArrowDown');
    await tabTo(page, page.getByRole('button', { name: /^fill$/i }));
    await page.keyboard.press('Enter');
    await page.getByText(/6 of 6/).first().waitFor();
    await tabTo(page, page.getByRole('button', { name: /review order/i }));
    await page.keyboard.press('Enter');
    await tabTo(page, page.getByRole('checkbox', { name: /i have read the allergens/i }));
    await page.keyboard.press('Space');
    await tabTo(page, page.getByRole('button', { name: /^pay \$/i }));
    await page.keyboard.press('Enter');
    // the payments stand-in's page, by keyboard too
    await page.getByRole('heading', { name: /^pay \$/i }).waitFor();
    await tabTo(page, page.getByLabel(/card number/i));
    await page.keyboard.type('4242 4242 4242 4242');
    await tabTo(page, page.getByLabel(/expiry/i));
    await page.keyboard.type('12/34');
    await tabTo(page, page.getByLabel(/security code/i));
    await page.keyboard.type('123');
    await tabTo(page, page.getByRole('button', { name: /^pay/i }));
    await page.keyboard.press('Enter');
    await page.getByText(/your pickup code/i).waitFor({ timeout: 30_000 });
  });

  it('finds and refunds an order with the keyboard alone', async () => {
    const page = await signedIn('owner');
    await page.setViewportSize(widths.desktop);
    await page.goto(`${appUrl}/staff/bake-days/${fixture.openDayId}`);
    await page.getByRole('heading', { name: /^orders for /i }).waitFor();
    await tabTo(page, page.getByRole('searchbox', { name: /find an order/i }));
    await page.keyboard.type('screens.customer');
    const order = page.getByRole('article').filter({ hasText: /screens\.customer/i }).first();
    await order.waitFor();
    await tabTo(page, order.getByRole('button', { name: /^refund/i }));
    await page.keyboard.press('Enter');
    const dialog = page.getByRole('dialog');
    await tabTo(page, dialog.getByLabel(/reason/i));
    await page.keyboard.type('Keyboard check: whole order');
    await tabTo(page, dialog.getByRole('button', { name: /^refund \$/i }));
    await page.keyboard.press('Enter');
    await page.getByText(/the order is now refunded/i).waitFor();
  });
});
