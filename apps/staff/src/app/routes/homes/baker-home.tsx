import { PageFrame } from '../../../components/page-frame';
import { Caution } from '@fryline/ui';
import { NextBakeDay } from '../../../features/bake-days/components/next-bake-day';
import { formatMoment } from '@fryline/ui/format';
import { SectionLinks } from './section-links';

export function BakerHome() {
  return (
    <PageFrame title="Baker — tonight's bake" intro="What to mix tonight and when, for the next bake day.">
      <NextBakeDay>
        {(day) => (
          <p className={`notice ${day.status === 'open' ? 'notice-warn' : ''}`}>
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
