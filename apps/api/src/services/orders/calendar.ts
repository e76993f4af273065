import { createEvent } from 'ics';
import type { Me } from '@fryline/schemas';
import type { Transaction } from 'sequelize';
import { AuditEntry, BakeDay, Order, PickupWindow } from '../../db/models/index.js';
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
  /** RFC 5545 SEQUENCE: 0 when first sent, one more for each change to the event. */
  sequence: number;
  /**
   * RFC 5546 METHOD: PUBLISH for a file the customer downloads; REQUEST for the
   * e-mailed event (a later REQUEST with the same UID and a higher SEQUENCE
   * replaces it in the calendar); CANCEL to take it out.
   */
  method: 'PUBLISH' | 'REQUEST' | 'CANCEL';
  /** Needed for REQUEST and CANCEL (RFC 5546 §3.2): the shop as organizer, the customer as attendee. */
  organizerEmail?: string;
  attendee?: { name: string; email: string };
}

/** Every pickup event of one order shares this UID, so each update replaces the last. */
export const pickupUid = (orderId: string) => `pickup-${orderId}@fryline.local`;

/** An RFC 5545 calendar entry for a pickup window (times in UTC, which every calendar converts). */
export function pickupCalendar(event: PickupEvent): string {
  const utc = (d: Date) => [d.getUTCFullYear(), d.getUTCMonth() + 1, d.getUTCDate(), d.getUTCHours(), d.getUTCMinutes()] as [number, number, number, number, number];
  const invite = event.method !== 'PUBLISH' && event.organizerEmail && event.attendee;
  const { error, value } = createEvent({
    uid: pickupUid(event.orderId),
    productId: 'fryline/pickup',
    method: event.method,
    sequence: event.sequence,
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
    status: event.method === 'CANCEL' ? 'CANCELLED' : 'CONFIRMED',
    busyStatus: 'FREE',
    ...(invite
      ? {
          organizer: { name: event.shopName, email: event.organizerEmail! },
          attendees: [{ name: event.attendee!.name || event.attendee!.email, email: event.attendee!.email, rsvp: false, partstat: 'ACCEPTED' as const, role: 'REQ-PARTICIPANT' as const }],
        }
      : {}),
  });
  if (error || !value) throw error ?? new Error('calendar entry could not be made');
  return value;
}

/** How many times the order's pickup has changed: the SEQUENCE of its current calendar entry. */
export async function pickupSequence(orderId: string, transaction?: Transaction): Promise<number> {
  return AuditEntry.count({ where: { subjectType: 'order', subjectId: orderId, action: 'order.moved' }, transaction });
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
    sequence: await pickupSequence(order.id),
    method: 'PUBLISH',
  });
}
