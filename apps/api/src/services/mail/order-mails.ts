import QRCode from 'qrcode';
import { DateTime } from 'luxon';
import type { Transaction } from 'sequelize';
import { boxLabel, formatCents } from '@fryline/schemas';
import { BakeDay, Order, OrderBox, OrderLine, PickupWindow, User } from '../../db/models/index.js';
import { enqueueMail } from './outbox.js';
import { renderMail } from './templates.js';
import { shopSettings } from '../shop/settings.js';
import { pickupCalendar } from '../orders/calendar.js';
import { context } from '../../integrations/context.js';

interface Loaded {
  order: Order;
  user: User;
  day: BakeDay;
  window: PickupWindow;
  boxes: OrderBox[];
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
  return { order, user: order.user!, day: order.bakeDay!, window: order.pickupWindow!, boxes: order.boxes ?? [] };
}

export function windowText(day: BakeDay, window: PickupWindow): string {
  const start = DateTime.fromJSDate(window.startsAt, { zone: day.timeZone });
  const end = DateTime.fromJSDate(window.endsAt, { zone: day.timeZone });
  return `${start.toFormat('cccc d LLLL yyyy')}, ${start.toFormat('h:mm a')}–${end.toFormat('h:mm a')} (${start.toFormat('ZZZZ')})`;
}

function boxLines(boxes: OrderBox[]): string[] {
  return [...boxes]
    .sort((a, b) => a.position - b.position)
    .map((box) => {
      const items = (box.lines ?? []).map((l) => `${l.quantity} × ${l.name}`).join(', ');
      return `• ${boxLabel(box.size)}: ${items}`;
    });
}

function allergenText(boxes: OrderBox[]): string {
  const set = new Set(boxes.flatMap((b) => (b.lines ?? []).flatMap((l) => l.allergens)));
  return set.size ? `Allergens in this order: ${[...set].sort().join(', ')}.` : 'No allergens were listed for these items.';
}

/** The paid order's confirmation: pickup code, its QR code, a calendar entry and the allergens. */
export async function queueConfirmation(orderId: string, transaction: Transaction) {
  const { order, user, day, window, boxes } = await load(orderId, transaction);
  const { shopName } = await shopSettings(transaction);
  const { publicUrl } = context().config;
  const url = `${publicUrl}/orders/${order.id}`;
  const code = order.pickupCode!;
  const qr = await QRCode.toBuffer(code, { type: 'png', errorCorrectionLevel: 'M', margin: 2, scale: 8 });
  const ics = pickupCalendar({ orderId: order.id, code, shopName, place: day.place, address: day.address, startsAt: window.startsAt, endsAt: window.endsAt, url });
  const mail = renderMail(
    `Your pickup code ${code} — ${shopName}`,
    [
      `Hello ${user.name || 'there'},`,
      `Thank you — your order is paid. Your pickup code is ${code}.`,
      `Collect it at ${day.place}${day.address ? `, ${day.address}` : ''}\n${windowText(day, window)}`,
      ...boxLines(boxes),
      `Total paid: ${formatCents(order.totalCents)}`,
      allergenText(boxes),
      `Plans changed? You can cancel for a full refund before ${DateTime.fromJSDate(day.cutoffAt, { zone: day.timeZone }).toFormat("cccc d LLLL, h:mm a")}: ${url}`,
      `— ${shopName}`,
    ],
    `<p><img src="cid:pickup-qr" alt="QR code for pickup code ${code}" width="200" height="200"></p>`,
  );
  await enqueueMail(
    {
      kind: 'confirmation',
      to: user.email,
      ...mail,
      dedupeKey: `confirmation:${order.id}`,
      attachments: [
        { filename: `pickup-${code}.png`, contentType: 'image/png', content: qr.toString('base64'), cid: 'pickup-qr' },
        { filename: 'pickup.ics', contentType: 'text/calendar; charset=utf-8; method=PUBLISH', content: Buffer.from(ics).toString('base64') },
      ],
    },
    transaction,
  );
}

async function simpleOrderMail(
  orderId: string,
  kind: string,
  dedupeKey: string,
  subject: (shop: string) => string,
  body: (l: Loaded) => string[],
  transaction: Transaction,
) {
  const loaded = await load(orderId, transaction);
  const { shopName } = await shopSettings(transaction);
  const mail = renderMail(subject(shopName), [`Hello ${loaded.user.name || 'there'},`, ...body(loaded), `— ${shopName}`]);
  await enqueueMail({ kind, to: loaded.user.email, ...mail, dedupeKey }, transaction);
}

export const queueLateRefundApology = (orderId: string, transaction: Transaction) =>
  simpleOrderMail(
    orderId,
    'late-payment-refund',
    `late-payment-refund:${orderId}`,
    (shop) => `Sorry — we couldn't keep your order (${shop})`,
    ({ order }) => [
      `Your payment arrived after your reserved box had been released, and by then that bake day had sold out.`,
      `We have refunded the full ${formatCents(order.totalCents)} to your card. Refunds usually take a few days to show.`,
      `We're sorry. You can join the waitlist for that day, or look at our next bake days.`,
    ],
    transaction,
  );

export const queueCancellation = (orderId: string, refundCents: number, transaction: Transaction) =>
  simpleOrderMail(
    orderId,
    'cancellation',
    `cancellation:${orderId}`,
    (shop) => `Your order is cancelled — ${shop}`,
    ({ day, window }) => [
      `Your order for ${windowText(day, window)} is cancelled.`,
      refundCents > 0 ? `We have refunded ${formatCents(refundCents)} to your card. Refunds usually take a few days to show.` : `Nothing was charged.`,
    ],
    transaction,
  );

export const queueReminder = (orderId: string, transaction: Transaction) =>
  simpleOrderMail(
    orderId,
    'reminder',
    `reminder:${orderId}`,
    (shop) => `See you tomorrow — ${shop}`,
    ({ order, day, window, boxes }) => [
      `A reminder: your doughnuts will be ready ${windowText(day, window)} at ${day.place}${day.address ? `, ${day.address}` : ''}.`,
      `Your pickup code is ${order.pickupCode}.`,
      ...boxLines(boxes),
      allergenText(boxes),
    ],
    transaction,
  );

export const queueRefundNotice = (orderId: string, refundId: string, amountCents: number, transaction: Transaction) =>
  simpleOrderMail(
    orderId,
    'refund',
    `refund:${refundId}`,
    (shop) => `A refund of ${formatCents(amountCents)} — ${shop}`,
    () => [`We have refunded ${formatCents(amountCents)} for your order. Refunds usually take a few days to show.`],
    transaction,
  );
