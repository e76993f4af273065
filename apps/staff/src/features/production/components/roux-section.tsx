import type { RouxPlan } from '@fryline/production';
import { formatMass, formatPercent, formatTemp, trimmed, type Units } from '../../../lib/units';
import { Facts, SheetSection } from './sheet-section';

/** The milk roux (tangzhong): flour cooked in milk before the mix. */
export function RouxSection({ roux, units }: { roux: RouxPlan; units: Units }) {
  const mass = (grams: number) => formatMass(grams, units.mass);
  return (
    <SheetSection id="roux" title="Milk roux">
      <Facts
        facts={[
          { label: 'Flour', value: mass(roux.flourGrams), note: `${formatPercent(roux.flourPercent)} of the flour` },
          { label: 'Milk', value: mass(roux.milkGrams), note: `1 : ${trimmed(roux.liquidPerFlour, 2)} flour to milk` },
          { label: 'Cook to', value: formatTemp(roux.cookToC, units.temp), hint: 'whisking, until it thickens' },
          { label: 'Makes', value: mass(roux.totalGrams), hint: 'cool it, covered', screenOnly: true },
        ]}
      />
    </SheetSection>
  );
}
