import type { BakeDayView } from '@fryline/schemas';
import { formatMoment, plural } from '@fryline/ui/format';

export type Availability = 'upcoming' | 'open' | 'sold-out' | 'closed' | 'done';

export interface AvailabilityInfo {
  kind: Availability;
  /** Short badge text. */
  badge: string;
  badgeClass: string;
  /** One line about what can be ordered. */
  line: string;
}

/** Below this share of capacity we say "only N left". */
const LOW_SHARE = 0.15;

function leftText(left: number, capacity: number, one: string): string {
  if (left <= 0) return `${one[0]!.toUpperCase()}${one.slice(1)}s sold out`;
  const text = `${plural(left, one)} left`;
  return left <= Math.max(1, Math.floor(capacity * LOW_SHARE)) ? `Only ${text}` : text;
}

/** What a customer can do for a bake day right now, in words. */
export function availabilityOf(day: BakeDayView): AvailabilityInfo {
  const { remaining, capacity } = day;
  switch (day.status) {
    case 'upcoming':
      return {
        kind: 'upcoming',
        badge: 'Coming up',
        badgeClass: 'badge-plum',
        line: `Orders open ${formatMoment(day.ordersOpenAt, day.timeZone)}`,
      };
    case 'closed':
      return { kind: 'closed', badge: 'Orders closed', badgeClass: '', line: 'Pre-orders for this bake day have closed.' };
    case 'done':
      return { kind: 'done', badge: 'Baked', badgeClass: '', line: 'This bake day is over.' };
    case 'open': {
      if (remaining.rings <= 0 && remaining.holes <= 0) {
        return { kind: 'sold-out', badge: 'Sold out', badgeClass: 'badge-bad', line: 'Sold out. Join the waitlist in case boxes free up.' };
      }
      const parts = [leftText(remaining.rings, capacity.rings, 'ring')];
      if (capacity.holes > 0) parts.push(leftText(remaining.holes, capacity.holes, 'hole'));
      const low = parts.some((p) => p.startsWith('Only') || p.endsWith('sold out'));
      return { kind: 'open', badge: low ? 'Going fast' : 'Open', badgeClass: low ? 'badge-warn' : 'badge-ok', line: parts.join(' · ') };
    }
  }
}
