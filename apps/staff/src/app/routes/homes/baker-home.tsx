import { PageFrame } from '../../../components/page-frame';
import { Caution } from '@fryline/ui';
import { NextBakeDay } from '../../../features/bake-days/components/next-bake-day';
import { formatDate, formatMoment } from '@fryline/ui/format';
import { SectionLinks } from './section-links';

/** "today", "tomorrow", "in 3 days": how far off a bake day is, counted in its own time zone. */
function daysAway(date: string, timeZone: string): string {
  const today = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(new Date());
  const days = Math.round((Date.parse(`${date}T00:00:00Z`) - Date.parse(`${today}T00:00:00Z`)) / 86_400_000);
  if (days === 0) return 'today';
  if (days === 1) return 'tomorrow';
  return days > 1 ? `in ${days} days` : `${-days} days ago`;
}

export function BakerHome() {
  return (
    <PageFrame title="Baker — the next bake" intro="When the next bake is, what to mix and when.">
      <NextBakeDay>
        {(day) => (
          <p className={`notice ${day.status === 'open' ? 'notice-warn' : ''}`}>
            <span className="block font-extrabold">
              The bake is {formatDate(day.date, day.timeZone)} ({daysAway(day.date, day.timeZone)}); the dough is mixed the day before.
            </span>
            {day.status === 'open'
              ? `Orders are still coming in until ${formatMoment(day.cutoffAt, day.timeZone)}; the numbers are final after that.`
              : day.status === 'upcoming'
                ? 'Pre-orders have not opened yet.'
                : 'Orders are closed: the numbers are final.'}
          </p>
        )}
      </NextBakeDay>
      <SectionLinks label="Baker pages" paths={['production', 'formula', 'pickups']} />
      <Caution title="Hot oil">
        <ul className="mt-1 list-disc space-y-1 pl-5">
          <li>Never leave the pot while the oil is on the heat.</li>
          <li>Keep a lid within reach to smother a fire. Never put water on burning oil.</li>
          <li>Keep children and pets away from the stove.</li>
          <li>Watch the thermometer; turn the heat off if the oil starts to smoke.</li>
          <li>Follow your local fire and food-safety rules and licensed kitchen practice.</li>
        </ul>
      </Caution>
    </PageFrame>
  );
}
