import { createEvent } from 'ics';
import type { Me } from '@fryline/schemas';
import { BakeDay, Order, PickupWindow } from '../../db/models/index.js';
import { notFound } from '../../lib/app-error.js';
import { context } from '../../integrations/context.js';
import { shopSettings } from '../shop/settings.js';

export interface PickupEvent {
  orderId: string;
  code: string;
  shopName: string;
  place: string;
  address: string;
  startsAt: Date;
  endsAt: Date;
  url: string;
}

/** An RFC 5545 calendar entry for a pickup window (times in UTC, which every calendar converts). */
export function pickupCalendar(event: PickupEvent): string {
  const utc = (d: Date) => [d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate(), d.getUTCHours(), d.getUTCMinutes()] as [number, number, number, number, number];
  const { error, value } = createEvent({
    uid: `pickup-${event.orderId}@fryline.local`,
    productId: 'fryline/pickup',
    title: `Pick up your doughnuts — ${event.shopName}`,
    description: `Pickup code: ${event.code}\nShow this code (or its QR code) at the stall.\n${event.url}`,
    location: [event.place, event.address].filter(Boolean).join(', '),
    start: utc(event.startsAt),
    startInputType: 'utc',
    startOutputType: 'utc',
    end: utc(event.endsAt),
    endInputType: 'utc',
    endOutputType: 'utc',
    url: event.url,
    status: 'CONFIRMED',
    busyStatus: 'FREE',
  });
  if (error || !value) throw error ?? new Error('calendar entry could not be made');
  return value;
}

/** A paid (or collected) order's pickup as a calendar file, for its own customer only. */
export async function orderCalendar(user: Me, orderId: string): Promise<string> {
  const order = await Order.findOne({
    where: { id: orderId, userId: user.id },
    include: [{ model: BakeDay, as: 'bakeDay' }, { model: PickupWindow, as: 'pickupWindow' }],
  });
  if (!order || !order.pickupCode || !['paid', 'collected'].includes(order.status)) throw notFound('Order');
  const { shopName } = await shopSettings();
  return pickupCalendar({
    orderId: order.id,
    code: order.pickupCode,
    shopName,
    place: order.bakeDay!.place,
    address: order.bakeDay!.address,
    startsAt: order.pickupWindow!.startsAt,
    endsAt: order.pickupWindow!.endsAt,
    url: `${context().config.publicUrl}/orders/${order.id}`,
  });
}
