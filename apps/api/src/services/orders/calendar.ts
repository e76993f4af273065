import { createEvent } from 'ics';

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
