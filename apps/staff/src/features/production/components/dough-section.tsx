import type { BakePlan } from '@fryline/production';
import { formatMass, formatPercent, formatTemp, unitsInText, type Units } from '../../../lib/units';
import { mixerLines } from '../model/sheet';
import { cell, Facts, num, SheetSection, TableHead } from './sheet-section';

/** The dough target and every ingredient in grams, as it goes into the mixer. */
export function DoughSection({ plan, units }: { plan: BakePlan; units: Units }) {
  const { dough, pieces } = plan;
  const mass = (grams: number) => formatMass(grams, units.mass);
  const eggs = dough.eggs;
  const t = dough.temperature;
  return (
    <SheetSection id="dough" title="Dough">
      <Facts
        facts={[
          {
            label: `${t.liquid} at`,
            value: formatTemp(dough.liquidTemperatureC, units.temp),
            note: `for dough at ${formatTemp(t.targetC, units.temp)}`,
            hint: `counting ${t.factors.map((f) => `${f.name.toLowerCase()} ${formatTemp(f.tempC, units.temp)}`).join(', ')} and the mixer's warmth`,
          },
          {
            label: 'Dough to mix',
            value: mass(dough.doughGrams),
            note:
              eggs && mass(eggs.doughGramsWithWholeEggs) !== mass(dough.doughGrams)
                ? `${mass(eggs.doughGramsWithWholeEggs)} with whole eggs`
                : undefined,
          },
          { label: 'Total flour', value: mass(dough.totalFlourGrams), hint: 'starter and roux flour included' },
          {
            label: 'Hydration',
            value: formatPercent(dough.hydrationWithCarriedWaterPercent),
            note: `${formatPercent(dough.hydrationPercent)} free water`,
            hint: 'counting the water in milk, egg and butter',
          },
          {
            label: 'One ring',
            value: mass(pieces.ringGrams),
            hint: pieces.pieceMassSource.ring === 'measured' ? 'weighed' : 'worked out from the cutter',
          },
          {
            label: 'One hole',
            value: mass(pieces.holeGrams),
            hint: pieces.pieceMassSource.hole === 'measured' ? 'weighed' : 'worked out from the cutter',
          },
        ]}
      />
      <table className="w-full">
        <caption className="pb-1 text-left font-extrabold">Into the mixer</caption>
        <TableHead columns={['Ingredient', num('Weight')]} screenOnly />
        <tbody>
          {mixerLines(dough, plan.shopping.eggClass).map((line) => (
            <tr key={line.name}>
              <th scope="row" className={cell.row}>
                {line.name}
                {line.note && <span className="sheet-note block text-sm font-normal text-muted">{line.note}</span>}
                {line.hint && <span className="sheet-hint block text-sm font-normal text-muted">{line.hint}</span>}
              </th>
              <td className={cell.num}>{mass(line.grams)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr>
            <th scope="row" className={`${cell.row} border-b-0 font-extrabold`}>
              Dough
            </th>
            <td className={`${cell.num} border-b-0 font-extrabold`}>{mass(dough.doughGrams)}</td>
          </tr>
        </tfoot>
      </table>
      {eggs && (
        <p className="text-sm text-muted">
          Eggs: {eggs.count} whole, rounded to the {unitsInText(eggs.rule, units)}. Whole eggs {eggs.massChangeGrams >= 0 ? 'add' : 'take off'}{' '}
          {mass(Math.abs(eggs.massChangeGrams))}.
        </p>
      )}
    </SheetSection>
  );
}
