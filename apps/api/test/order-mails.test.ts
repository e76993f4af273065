import { beforeEach, describe, expect, it } from 'vitest';
import { JSDOM } from 'jsdom';
import ICAL from 'ical.js';
import { formatCents } from '@fryline/schemas';
import { ShopSettings } from '../src/db/models/index.js';
import { Browser, signIn, useStack } from './support.js';
import { deliverMail, openDay, orderAndPay } from './order-helpers.js';

const stack = useStack();
const SHOP = 'Northside Dough Co.'; // our own fictional business
let customer: Browser;
beforeEach(async () => {
  await ShopSettings.update({ shopName: SHOP, taxMode: 'added', taxRateBp: 825 }, { where: { id: 1 } });
  customer = new Browser(stack.url);
  await signIn(customer, 'customer@fryline.test');
});

type Mail = Awaited<ReturnType<typeof stack.mail.waitFor>>;

/** A calendar attachment read by ical.js, a general-purpose RFC 5545 parser. */
function calendarOf(mail: Mail) {
  const file = mail.attachments.find((a) => a.contentType.startsWith('text/calendar'));
  if (!file) throw new Error(`no calendar attachment in "${mail.subject}"`);
  const root = new ICAL.Component(ICAL.parse(Buffer.from(file.content).toString('utf8')));
  const vevent = root.getFirstSubcomponent('vevent')!;
  return {
    method: root.getFirstPropertyValue('method'),
    uid: vevent.getFirstPropertyValue('uid'),
    sequence: Number(vevent.getFirstPropertyValue('sequence') ?? 0),
    status: vevent.getFirstPropertyValue('status'),
    start: new ICAL.Event(vevent).startDate.toJSDate().toISOString(),
    summary: String(vevent.getFirstPropertyValue('summary')),
  };
}

/** A mixed dozen with flavour surcharges, 8.25 % sales tax added. */
async function paidSurchargedDozen(windowIndex = 0) {
  const day = await openDay(stack);
  const extra = day.menu.filter((m) => m.kind === 'ring' && m.surchargeCents > 0);
  const plain = day.menu.find((m) => m.kind === 'ring' && m.surchargeCents === 0)!;
  expect(extra.length).toBeGreaterThanOrEqual(2);
  const body = {
    bakeDayId: day.id,
    pickupWindowId: day.pickupWindows[windowIndex]!.id,
    boxes: [{ size: 'dozen', items: [{ menuItemId: plain.id, quantity: 4 }, { menuItemId: extra[0]!.id, quantity: 5 }, { menuItemId: extra[1]!.id, quantity: 3 }] }],
  };
  const { order } = await orderAndPay(stack, customer, body);
  return { day, order, extra };
}

describe('order e-mails (MJML HTML + a text part with the same content)', () => {
  it('the confirmation carries the shop name, bill lines that add up, total, QR and code, pickup place and window, allergens and the refund deadline', async () => {
    const { day, order, extra } = await paidSurchargedDozen();
    const detail = (await customer.getJson(`/api/orders/${order.id}`)).body;
    await deliverMail(stack);
    const mail = await stack.mail.waitFor((m) => m.subject.startsWith('Your pickup code'), 5000);
    expect(mail.subject).toContain(SHOP);

    const doc = new JSDOM(mail.html ?? '').window.document;
    const text = (sel: string) => doc.querySelector(sel)?.textContent?.replace(/\s+/g, ' ').trim() ?? '';
    expect(text('[data-mail="shop-name"]')).toBe(SHOP);
    expect(text('[data-mail="code"]')).toBe(detail.pickupCode);
    // the QR image points at the attached PNG (mailparser inlines cid: references as data: URLs)
    const qr = doc.querySelector(`img[alt="QR code for pickup code ${detail.pickupCode}"]`);
    expect(qr?.getAttribute('src')).toMatch(/^(cid:pickup-qr|data:image\/png;base64,)/);
    expect(mail.attachments.find((a) => a.contentType === 'image/png')).toBeTruthy();

    // the bill: a box line, one line per surcharged flavour, the tax line; they add up to the total
    const lines = [...doc.querySelectorAll('[data-mail="bill-line"]')];
    const cents = lines.map((l) => Number(l.getAttribute('data-cents')));
    expect(cents.length).toBe(4);
    expect([cents[0], cents[3]]).toEqual([3000, detail.taxCents]);
    // one line per surcharged flavour, in the order's own line order
    const lineFor = (name: string) => lines.find((l) => l.textContent?.includes(name));
    expect(Number(lineFor(extra[0]!.name)?.getAttribute('data-cents'))).toBe(5 * extra[0]!.surchargeCents);
    expect(Number(lineFor(extra[1]!.name)?.getAttribute('data-cents'))).toBe(3 * extra[1]!.surchargeCents);
    expect(cents.reduce((a, b) => a + b, 0)).toBe(detail.totalCents);
    expect(Number(doc.querySelector('[data-mail="bill-total"]')!.getAttribute('data-cents'))).toBe(detail.totalCents);
    expect(text('[data-mail="bill-total"]')).toContain(formatCents(detail.totalCents));
    expect(lines.slice(1, 3).map((l) => l.textContent).join(' ')).toContain(extra[0]!.name);
    expect(lines[3]!.textContent).toMatch(/Tax/);

    const pickup = text('.mail-pickup');
    expect(pickup).toContain(day.place);
    expect(pickup).toMatch(/\d{1,2}:\d{2} (AM|PM)–\d{1,2}:\d{2} (AM|PM)/);
    expect(text('[data-mail="allergens"]')).toMatch(/eggs.*milk.*wheat/);
    expect(text('[data-mail="refund-deadline"]')).toMatch(/full refund until \w+day \d+ \w+ at \d{1,2}:\d{2} (AM|PM)/);
    expect(doc.querySelector(`a[href$="/orders/${order.id}"]`)).not.toBeNull();
    expect(text('body')).toContain('Sent with Fryline');

    // the text part says the same things
    for (const piece of [
      SHOP,
      detail.pickupCode,
      day.place,
      doc.querySelectorAll('.mail-pickup td')[1]!.textContent!.trim(),
      ...lines.map((l) => l.querySelector('td')!.textContent!.trim()),
      ...cents.map((c) => formatCents(c)),
      formatCents(detail.totalCents),
      text('[data-mail="allergens"]'),
      text('[data-mail="refund-deadline"]'),
    ]) {
      expect(mail.text).toContain(piece);
    }
  });

  it('moving the pickup window sends an updated calendar entry (same UID, higher SEQUENCE, METHOD:REQUEST); cancelling sends METHOD:CANCEL (RFC 5545, RFC 5546, read with ical.js)', async () => {
    const { day, order } = await paidSurchargedDozen(0);
    await deliverMail(stack);
    const first = calendarOf(await stack.mail.waitFor((m) => m.subject.startsWith('Your pickup code'), 5000));
    expect(first).toMatchObject({ method: 'REQUEST', sequence: 0, status: 'CONFIRMED' });
    expect(first.summary).toContain(SHOP);

    const moved = await customer.send('POST', `/api/orders/${order.id}/move`, { pickupWindowId: day.pickupWindows[2]!.id });
    expect(moved.status).toBe(200);
    await deliverMail(stack);
    const update = calendarOf(await stack.mail.waitFor((m) => m.subject.startsWith('New pickup time'), 5000));
    expect(update.method).toBe('REQUEST');
    expect(update.uid).toBe(first.uid);
    expect(update.sequence).toBeGreaterThan(first.sequence);
    expect(update.start).toBe(new Date(day.pickupWindows[2]!.startsAt).toISOString());

    const again = await customer.send('POST', `/api/orders/${order.id}/move`, { pickupWindowId: day.pickupWindows[1]!.id });
    expect(again.status).toBe(200);
    await deliverMail(stack);
    const second = calendarOf(await stack.mail.waitFor((m) => m.subject.startsWith('New pickup time') && calendarOf(m).sequence > update.sequence, 5000));
    expect(second.start).toBe(new Date(day.pickupWindows[1]!.startsAt).toISOString());

    expect((await customer.send('POST', `/api/orders/${order.id}/cancel`)).status).toBe(200);
    await stack.payments.webhooksIdle();
    await deliverMail(stack);
    const cancel = calendarOf(await stack.mail.waitFor((m) => m.subject.startsWith('Your order is cancelled'), 5000));
    expect(cancel.method).toBe('CANCEL');
    expect(cancel.uid).toBe(first.uid);
    expect(cancel.status).toBe('CANCELLED');
    expect(cancel.sequence).toBeGreaterThan(second.sequence);
  });

  it("a full refund by the owner says the order is cancelled and takes it out of the calendar; a part refund doesn't", async () => {
    const owner = new Browser(stack.url);
    await signIn(owner, 'owner@fryline.test');
    const { order } = await paidSurchargedDozen();
    const part = await owner.send('POST', `/api/staff/orders/${order.id}/refunds`, { amountCents: 200, reason: 'One ring dropped' }, { 'idempotency-key': `part-${order.id}` });
    expect(part.status).toBe(201);
    const rest = await owner.send('POST', `/api/staff/orders/${order.id}/refunds`, { amountCents: order.totalCents - 200, reason: 'Stall closed' }, { 'idempotency-key': `rest-${order.id}` });
    expect(rest.status).toBe(201);
    await stack.payments.webhooksIdle();
    await deliverMail(stack);
    const partMail = await stack.mail.waitFor((m) => m.subject.startsWith(`A refund of ${formatCents(200)}`), 5000);
    expect(partMail.text).not.toMatch(/cancelled/i);
    expect(partMail.attachments.some((a) => a.contentType.startsWith('text/calendar'))).toBe(false);
    const full = await stack.mail.waitFor((m) => m.subject.startsWith('Your order is cancelled and refunded'), 5000);
    expect(full.text).toMatch(/is cancelled, and we have refunded it in full/);
    expect(calendarOf(full).method).toBe('CANCEL');
  });
});
