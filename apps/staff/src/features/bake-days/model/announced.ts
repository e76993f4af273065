import type { BakeDayView } from '@fryline/schemas';

/** What the Bake days page says after a bake day was announced or saved as a draft. */
export interface Announced {
  id: string;
  date: string;
  place: string;
  timeZone: string;
  published: boolean;
  ordersOpenAt: string;
  cutoffAt: string;
}

export function announcedFrom(day: BakeDayView, published: boolean): Announced {
  const { id, date, place, timeZone, ordersOpenAt, cutoffAt } = day;
  return { id, date, place, timeZone, published, ordersOpenAt, cutoffAt };
}

/** The router state the form leaves behind, if it is one. */
export function readAnnounced(state: unknown): Announced | null {
  if (typeof state !== 'object' || state === null || !('announced' in state)) return null;
  const value = (state as { announced: unknown }).announced;
  if (typeof value !== 'object' || value === null) return null;
  const a = value as Record<string, unknown>;
  const texts = ['id', 'date', 'place', 'timeZone', 'ordersOpenAt', 'cutoffAt'].every((key) => typeof a[key] === 'string');
  return texts && typeof a.published === 'boolean' ? (value as Announced) : null;
}
