import QRCode from 'qrcode';
import { DateTime } from 'luxon';
import type { Transaction } from 'sequelize';
import { boxLabel, formatCents, orderBill } from '@fryline/schemas';
import { BakeDay, Order, OrderBox, OrderLine, PickupWindow, User, type StoredAttachment } from '../../db/models/index.js';
import { enqueueMail } from './outbox.js';
import { mailShopOf, renderMail, type MailBlock, type MailShop } from './templates.js';
import { shopSettings } from '../shop/settings.js';
import { pickupCalendar, pickupSequence, type PickupEvent } from '../orders/calendar.js';
import { billOf } from '../orders/staff-orders.js';
import { context } from '../../integrations/context.js';

interface Loaded {
  order: Order;
  user: User;
  day: BakeDay;
  window: PickupWindow;
  boxes: OrderBox[];
  shop: MailShop;
  url: string;
}

async function load(orderId: string, transaction: Transaction): Promise<Loaded> {
  const order = await Order.findByPk(orderId, {
    include: [
      { model: OrderBox, as: 'boxes', include: [{ model: OrderLine, as: 'lines' }] },
      { model: PickupWindow, as: 'pickupWindow' },
      { model: BakeDay, as: 'bakeDay' },
      { model: User, as: 'user' },
    ],
    transaction,
  });
  if (!order) throw new Error(`order ${orderId} vanished`);
  const settings = await shopSettings(transaction);
  const boxes = [...(order.boxes ?? [])].sort((a, b) => a.position - b.position);
  return {
    order,
    user: order.user!,
    day: order.bakeDay!,
    window: order.pickupWindow!,
    boxes,
    // the order's amounts in the currency it was paid in, whatever the shop charges in now
    shop: { ...mailShopOf(settings), currency: order.currency },
    url: `${context().config.publicUrl}/orders/${order.id}`,
  };
}

export function windowText(day: BakeDay, window: PickupWindow): string {
  const start = DateTime.fromJSDate(window.startsAt, { zone: day.timeZone });
  const end = DateTime.fromJSDate(window.endsAt, { zone: day.timeZone });
  return `${start.toFormat('cccc d LLLL yyyy')}, ${start.toFormat('h:mm a')}–${end.toFormat('h:mm a')} (${start.toFormat('ZZZZ')})`;
}

const placeText = (day: BakeDay) => `${day.place}${day.address ? `\n${day.address}` : ''}`;

const greeting = (l: Loaded): MailBlock => ({ type: 'paragraph', text: `Hello ${l.user.name || 'there'},` });

const pickupFacts = (l: Loaded): MailBlock => ({
  type: 'facts',
  part: 'pickup',
  rows: [
    ['Where', placeText(l.day)],
    ['When', windowText(l.day, l.window)],
  ],
});

const contents = (l: Loaded): MailBlock => ({
  type: 'facts',
  part: 'boxes',
  rows: l.boxes.map((box) => [boxLabel(box.size), (box.lines ?? []).map((x) => `${x.quantity} × ${x.name}`).join('\n')]),
});

const bill = (l: Loaded): MailBlock => ({ type: 'bill', bill: orderBill(billOf(l.order), l.shop.currency), refundedCents: l.order.refundedCents });

function allergens(l: Loaded): MailBlock {
  const set = new Set(l.boxes.flatMap((b) => (b.lines ?? []).flatMap((x) => x.allergens)));
  return { type: 'allergens', text: set.size ? `${[...set].sort().join(', ')}.` : 'none were listed for these items; ask us if you are unsure.' };
}

function refundDeadline(l: Loaded): MailBlock {
  const cutoff = DateTime.fromJSDate(l.day.cutoffAt, { zone: l.day.timeZone }).toFormat("cccc d LLLL 'at' h:mm a");
  return { type: 'note', part: 'refund-deadline', text: `Plans changed? You can cancel for a full refund until ${cutoff}, when pre-orders close. After that, please get in touch with us.` };
}

const orderButton = (l: Loaded): MailBlock => ({ type: 'button', label: 'See your order', href: l.url });

/** Where and when, what is in it, what it cost, allergens and until when it can be cancelled. */
const orderSummary = (l: Loaded): MailBlock[] => [
  { type: 'heading', text: 'Pickup' },
  pickupFacts(l),
  { type: 'heading', text: 'Your order' },
  contents(l),
  bill(l),
  allergens(l),
  refundDeadline(l),
  orderButton(l),
];

/** The order's pickup as a calendar invitation (RFC 5546), attached to the mail. */
function calendarAttachment(l: Loaded, method: PickupEvent['method'], sequence: number): StoredAttachment {
  const address = /<([^>]+)>/.exec(context().config.MAIL_FROM)?.[1] ?? context().config.MAIL_FROM;
  const ics = pickupCalendar({
    orderId: l.order.id,
    code: l.order.pickupCode ?? '',
    shopName: l.shop.name,
    place: l.day.place,
    address: l.day.address,
    startsAt: l.window.startsAt,
    endsAt: l.window.endsAt,
    url: l.url,
    sequence,
    method,
    organizerEmail: address,
    attendee: { name: l.user.name, email: l.user.email },
  });
  return {
    filename: method === 'CANCEL' ? 'pickup-cancelled.ics' : 'pickup.ics',
    contentType: `text/calendar; charset=utf-8; method=${method}`,
    content: Buffer.from(ics).toString('base64'),
  };
}

/** The paid order's confirmation: pickup code, its QR code, the bill, a calendar entry and the allergens. */
export async function queueConfirmation(orderId: string, transaction: Transaction) {
  const l = await load(orderId, transaction);
  const code = l.order.pickupCode!;
  const qr = await QRCode.toBuffer(code, { type: 'png', errorCorrectionLevel: 'M', margin: 2, scale: 8 });
  const mail = await renderMail({
    subject: `Your pickup code ${code} — ${l.shop.name}`,
    shop: l.shop,
    preview: `Paid and confirmed. Pickup code ${code}, ${windowText(l.day, l.window)}.`,
    blocks: [
      greeting(l),
      { type: 'paragraph', text: 'Thank you — your order is paid and your doughnuts are on the list for the bake.' },
      { type: 'code', code, qrCid: 'pickup-qr' },
      { type: 'paragraph', text: 'Show this code, or its QR code, when you collect.' },
      ...orderSummary(l),
    ],
  });
  await enqueueMail(
    {
      kind: 'confirmation',
      to: l.user.email,
      ...mail,
      dedupeKey: `confirmation:${l.order.id}`,
      attachments: [
        { filename: `pickup-${code}.png`, contentType: 'image/png', content: qr.toString('base64'), cid: 'pickup-qr' },
        calendarAttachment(l, 'REQUEST', await pickupSequence(l.order.id, transaction)),
      ],
    },
    transaction,
  );
}

/** The pickup window moved: the new time, and a calendar update that replaces the saved entry. */
export async function queuePickupMoved(orderId: string, transaction: Transaction) {
  const l = await load(orderId, transaction);
  const sequence = await pickupSequence(orderId, transaction);
  const mail = await renderMail({
    subject: `New pickup time: ${windowText(l.day, l.window)} — ${l.shop.name}`,
    shop: l.shop,
    preview: `Your pickup is now ${windowText(l.day, l.window)}.`,
    blocks: [
      greeting(l),
      { type: 'paragraph', text: 'Your pickup time has changed. The attached calendar entry replaces the one you saved before.' },
      ...(l.order.pickupCode ? [{ type: 'code', code: l.order.pickupCode } as MailBlock] : []),
      ...orderSummary(l),
    ],
  });
  await enqueueMail(
    { kind: 'pickup-moved', to: l.user.email, ...mail, dedupeKey: `pickup-moved:${orderId}:${sequence}`, attachments: l.order.pickupCode ? [calendarAttachment(l, 'REQUEST', sequence)] : [] },
    transaction,
  );
}

/** An order that will not be collected any more: the calendar entry is taken out (METHOD:CANCEL). */
async function cancelledCalendar(l: Loaded, transaction: Transaction): Promise<StoredAttachment[]> {
  if (!l.order.pickupCode || !l.order.paidAt) return [];
  return [calendarAttachment(l, 'CANCEL', (await pickupSequence(l.order.id, transaction)) + 1)];
}

export async function queueLateRefundApology(orderId: string, transaction: Transaction) {
  const l = await load(orderId, transaction);
  const mail = await renderMail({
    subject: `Sorry — we couldn't keep your order (${l.shop.name})`,
    shop: l.shop,
    preview: `Your payment is refunded in full.`,
    blocks: [
      greeting(l),
      { type: 'paragraph', text: 'Your payment arrived after your reserved box had been released, and by then that bake day had sold out. Your order is cancelled.' },
      { type: 'paragraph', text: `We have refunded the full ${formatCents(l.order.totalCents, l.shop.currency)} to your card. Refunds usually take a few days to show.` },
      { type: 'paragraph', text: "We're sorry. You can join the waitlist for that day, or look at our next bake days." },
    ],
  });
  await enqueueMail({ kind: 'late-payment-refund', to: l.user.email, ...mail, dedupeKey: `late-payment-refund:${orderId}` }, transaction);
}

export async function queueCancellation(orderId: string, refundCents: number, transaction: Transaction) {
  const l = await load(orderId, transaction);
  const mail = await renderMail({
    subject: `Your order is cancelled — ${l.shop.name}`,
    shop: l.shop,
    preview: refundCents > 0 ? `Refunded ${formatCents(refundCents, l.shop.currency)}.` : 'Nothing was charged.',
    blocks: [
      greeting(l),
      { type: 'paragraph', text: `Your order for ${windowText(l.day, l.window)} is cancelled.` },
      { type: 'paragraph', text: refundCents > 0 ? `We have refunded ${formatCents(refundCents, l.shop.currency)} to your card. Refunds usually take a few days to show.` : 'Nothing was charged.' },
      contents(l),
      ...(refundCents > 0 ? [{ type: 'paragraph', text: 'The attached calendar update takes the pickup out of your calendar.' } as MailBlock] : []),
    ],
  });
  await enqueueMail({ kind: 'cancellation', to: l.user.email, ...mail, dedupeKey: `cancellation:${orderId}`, attachments: await cancelledCalendar(l, transaction) }, transaction);
}

export async function queueReminder(orderId: string, transaction: Transaction) {
  const l = await load(orderId, transaction);
  const mail = await renderMail({
    subject: `See you tomorrow — ${l.shop.name}`,
    shop: l.shop,
    preview: `Pickup ${windowText(l.day, l.window)} at ${l.day.place}.`,
    blocks: [
      greeting(l),
      { type: 'paragraph', text: 'A reminder: your doughnuts will be ready for you soon.' },
      ...(l.order.pickupCode ? [{ type: 'code', code: l.order.pickupCode } as MailBlock] : []),
      pickupFacts(l),
      contents(l),
      allergens(l),
      orderButton(l),
    ],
  });
  await enqueueMail({ kind: 'reminder', to: l.user.email, ...mail, dedupeKey: `reminder:${orderId}` }, transaction);
}

/**
 * The owner refunded money. A refund of everything that was left means the
 * order is cancelled; the mail says so and takes the pickup out of the calendar.
 */
export async function queueRefundNotice(orderId: string, refundId: string, amountCents: number, transaction: Transaction) {
  const l = await load(orderId, transaction);
  // releaseOrder turned a paid order refunded in full into 'refunded': it will not be collected
  const full = l.order.status === 'refunded';
  const mail = await renderMail({
    subject: full ? `Your order is cancelled and refunded — ${l.shop.name}` : `A refund of ${formatCents(amountCents, l.shop.currency)} — ${l.shop.name}`,
    shop: l.shop,
    preview: full ? `Refunded in full: ${formatCents(l.order.totalCents, l.shop.currency)}.` : `Refunded ${formatCents(amountCents, l.shop.currency)}.`,
    blocks: [
      greeting(l),
      full
        ? { type: 'paragraph', text: `Your order for ${windowText(l.day, l.window)} is cancelled, and we have refunded it in full (${formatCents(l.order.totalCents, l.shop.currency)}). There is nothing to collect.` }
        : { type: 'paragraph', text: l.order.status === 'paid' ? `We have refunded ${formatCents(amountCents, l.shop.currency)} for your order. Your order still stands: collect it as planned.` : `We have refunded ${formatCents(amountCents, l.shop.currency)} for your order.` },
      { type: 'paragraph', text: 'Refunds usually take a few days to show on your card.' },
      ...(l.order.status === 'paid' ? [pickupFacts(l)] : []),
      contents(l),
      bill(l),
    ],
  });
  await enqueueMail(
    { kind: 'refund', to: l.user.email, ...mail, dedupeKey: `refund:${refundId}`, attachments: full ? await cancelledCalendar(l, transaction) : [] },
    transaction,
  );
}
