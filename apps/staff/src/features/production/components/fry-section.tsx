import type { FryBatches, FryPlan } from '@fryline/production';
import { formatMass, formatMinutes, formatTemp, formatVolume, type Units } from '../../../lib/units';
import { cell, Facts, num, SheetSection, TableHead } from './sheet-section';

const limitWords: Record<FryBatches['limitedBy'], string> = {
  'pot-area': 'room in the pot',
  heat: 'how far the oil cools',
};

/** Fry batches, frying time and the oil. */
export function FrySection({ fry, units }: { fry: FryPlan; units: Units }) {
  const kinds = [
    { label: 'Rings', batches: fry.rings },
    { label: 'Holes', batches: fry.holes },
  ].filter((kind) => kind.batches.count > 0 || kind.label === 'Rings');
  return (
    <SheetSection id="fry" title="Frying">
      <table className="w-full">
        <caption className="sr-only">Fry batches</caption>
        <TableHead columns={[null, num('Pieces'), num('Per batch'), num('Batches'), num('Each side')]} />
        <tbody>
          {kinds.map(({ label, batches }) => (
            <tr key={label}>
              <th scope="row" className={cell.row}>
                {label}
                <span className="sheet-hint block text-sm font-normal text-muted">limited by {limitWords[batches.limitedBy]}</span>
              </th>
              <td className={cell.num}>{batches.count}</td>
              <td className={cell.num}>{batches.perBatch}</td>
              <td className={cell.num}>{batches.batches}</td>
              <td className={cell.num}>{Math.round(batches.secondsPerSide)} s</td>
            </tr>
          ))}
        </tbody>
      </table>
      <Facts
        facts={[
          { label: 'Fry batches', value: fry.batches },
          { label: 'Frying takes', value: `about ${formatMinutes(Math.ceil(fry.minutes))}`, hint: 'waiting for trays and for the oil to come back' },
          { label: 'Heat the oil', value: `about ${formatMinutes(Math.ceil(fry.heatUpMinutes))}`, hint: `${Math.round(fry.burnerNetWatts)} W reaching the oil` },
          { label: 'Start at', value: formatTemp(fry.oilStartC, units.temp) },
          { label: 'Never below', value: formatTemp(fry.oilFloorC, units.temp), hint: 'wait for the oil to come back' },
          { label: 'Oil in the pot', value: formatVolume(fry.oil.fillLitres, units.mass), note: formatMass(fry.oil.fillGrams, units.mass) },
          {
            label: 'Oil taken up',
            value: formatMass(fry.oilAbsorbedGrams, units.mass),
            note: `${formatMass(fry.rings.fatGramsPerPiece, units.mass)} a ring`,
            hint: 'about a fifth of each fried piece',
          },
          fry.oil.topUpGrams > 0 && {
            label: 'Top-up oil',
            value: formatMass(fry.oil.topUpGrams, units.mass),
            hint: `whenever about ${formatMass(fry.oil.topUpEveryGrams, units.mass)} has gone; see the timetable`,
          },
          { label: 'Oil to buy', value: formatMass(fry.oil.freshFillToBuyGrams, units.mass), note: 'a fresh fill and the top-ups' },
          fry.oil.freeboardMm !== null && {
            label: 'Room above the hot oil',
            value: `${Math.round(fry.oil.freeboardMm)} mm`,
            note: `keep at least ${Math.round(fry.oil.minFreeboardMm)} mm`,
            hint: 'hot oil stands higher, and a batch foams',
          },
        ]}
      />
    </SheetSection>
  );
}
