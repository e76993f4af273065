import type { MixSchedule, VariationPlan } from '@fryline/production';
import { formatClock, formatMoment } from '@fryline/ui/format';
import { formatMass, type Units } from '../../../lib/units';
import { cell, num, SheetSection, TableHead } from './sheet-section';

/** Each mix that fits the bowl: its dough, whole eggs, starter, the flavoured shares weighed off it, and its times. */
export function MixesSection({
  mixes, variations, timeZone, units,
}: { mixes: readonly MixSchedule[]; variations: readonly VariationPlan[]; timeZone: string; units: Units }) {
  if (mixes.length === 0) return null;
  const mass = (grams: number) => formatMass(grams, units.mass);
  const doughName = new Map(variations.map((v) => [v.id, v.name]));
  return (
    // One mix repeats on paper what Dough and Schedule print (its grams, eggs, starter and times): screen only then.
    <SheetSection id="mixes" title={mixes.length === 1 ? 'The mix' : `Mixes (${mixes.length})`} wide screenOnly={mixes.length === 1}>
      <table className="w-full">
        <caption className="sr-only">Mixes, one after another</caption>
        <TableHead columns={['Mix', num('Dough'), num('Eggs'), num('Starter'), 'Mix at', 'Bulk until', 'Roll at', 'Fries']} />
        <tbody>
          {mixes.map((m) => (
            <tr key={m.mix}>
              <th scope="row" className={cell.row}>
                {m.mix}
                <span className="sheet-note block text-sm font-normal text-muted">
                  {m.formulaOf === null ? 'base dough' : doughName.get(m.formulaOf) ?? m.formulaOf}
                </span>
                {m.portions.filter((p) => p.addIns.length > 0).map((p) => (
                  <span key={p.name} className="sheet-note block text-sm font-normal">
                    {mass(p.baseGrams)} for {p.name.toLowerCase()}: {p.addIns.map((a) => `${mass(a.grams)} ${a.name.toLowerCase()}`).join(', ')}
                  </span>
                ))}
              </th>
              <td className={cell.num}>{mass(m.doughGrams)}</td>
              <td className={cell.num}>{m.eggs ? m.eggs.count : '—'}</td>
              <td className={cell.num}>{m.starter ? mass(m.starter.grams) : '—'}</td>
              <td className={`${cell.text} tabular-nums whitespace-nowrap`}>{formatMoment(m.mixAt, timeZone)}</td>
              <td className={`${cell.text} tabular-nums whitespace-nowrap`}>{formatMoment(m.bulkUntil, timeZone)}</td>
              <td className={`${cell.text} tabular-nums whitespace-nowrap`}>{formatMoment(m.rollAt, timeZone)}</td>
              <td className={`${cell.text} tabular-nums whitespace-nowrap`}>
                {formatClock(m.fryFrom, timeZone)}–{formatClock(m.fryUntil, timeZone)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {mixes.length > 1 && (
        <p className="text-sm text-muted">
          Each mix is weighed and mixed on its own, with its own starter feed and roux; the grams in the Dough section are for all of them together.
        </p>
      )}
    </SheetSection>
  );
}
