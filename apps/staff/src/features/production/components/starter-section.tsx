import type { StarterSheet } from '@fryline/production';
import { formatMoment } from '@fryline/ui/format';
import { formatMass, formatPercent, trimmed, type Units } from '../../../lib/units';
import { Facts, SheetSection } from './sheet-section';

/** The starter (levain) build: what to feed, and when, so it peaks at the mix. */
export function StarterSection({ starter, timeZone, units }: { starter: StarterSheet; timeZone: string; units: Units }) {
  const mass = (grams: number) => formatMass(grams, units.mass);
  const { build } = starter;
  return (
    <SheetSection id="starter" title="Starter build">
      <Facts
        facts={[
          { label: 'Feed at', value: formatMoment(starter.feedAt, timeZone), note: `${trimmed(starter.hoursBeforeMix, 1)} h before the mix` },
          { label: 'Ratio', value: build.ratio, hint: 'ripe starter : flour : water' },
          { label: 'Ripe starter', value: mass(build.seedGrams) },
          { label: 'Flour', value: mass(build.flourGrams) },
          { label: 'Water', value: mass(build.waterGrams) },
          {
            label: 'Makes',
            value: mass(build.totalGrams),
            note: `${mass(starter.grams)} for the dough, ${formatPercent(build.extraPercent, 0)} extra`,
            hint: `at ${formatPercent(starter.hydrationPercent, 0)} hydration`,
          },
          {
            label: 'Peaks',
            value: `${trimmed(build.peakWindowHours.from, 1)}–${trimmed(build.peakWindowHours.to, 1)} h after the feed`,
            screenOnly: true,
          },
        ]}
      />
    </SheetSection>
  );
}
