import type { BakePlan } from '@fryline/production';
import { Caution } from '@fryline/ui';
import { formatClock } from '@fryline/ui/format';
import { formatMass, formatMinutes, formatTemp, type Units } from '../../../lib/units';
import { timetableRows } from '../model/sheet';
import { cell, Facts, num, SheetSection, TableHead } from './sheet-section';

/** The proofing trays in turn, and the fry timetable batch by batch with the reading to wait for. */
export function LineSection({ plan, timeZone, units }: { plan: BakePlan; timeZone: string; units: Units }) {
  const { line, fry } = plan;
  if (fry.timetable.length === 0) return null;
  const rows = timetableRows(plan, timeZone);
  const firstTray = line.trays[0];
  return (
    <SheetSection id="line" title="Proof and fry, batch by batch" wide>
      <Facts
        facts={[
          { label: 'On a tray', value: `${line.piecesPerTray.ring} rings or ${line.piecesPerTray.hole} holes`, hint: 'room to grow in the proof' },
          { label: 'Trays', value: line.trays.length, note: `at most ${line.traysInUse} proofing at once` },
          { label: 'Proof', value: `about ${formatMinutes(Math.round(line.proofMinutes))}`, hint: 'from the fridge; each tray out in turn' },
          firstTray && { label: 'First tray out of the fridge', value: formatClock(firstTray.proofFrom, timeZone) },
          { label: 'Glazing', value: `${formatClock(line.glazeFrom, timeZone)}–${formatClock(line.glazeUntil, timeZone)}`, hint: 'each batch once cooled, while the next fry' },
          { label: 'Packing', value: `${formatClock(line.packFrom, timeZone)}–${formatClock(line.packUntil, timeZone)}` },
        ]}
      />
      <Caution title="At the pot">
        Wait for the thermometer to read the temperature in the table before each batch goes in, lower pieces in gently and away from you,
        and never leave the pot. Add top-up oil slowly, between batches only.
      </Caution>
      <table className="sheet-timetable w-full">
        <caption className="pb-1 text-left font-extrabold">Fry timetable</caption>
        <TableHead columns={[num('Batch'), 'In at', 'Pieces', num('Wait for'), 'Glaze after']} />
        <tbody>
          {rows.map((row) => (
            <tr key={row.batch}>
              <td className={cell.num}>{row.batch}</td>
              <td className={`${cell.text} tabular-nums whitespace-nowrap`}>{row.at}</td>
              <th scope="row" className={`${cell.text} text-left font-semibold`}>
                {row.pieces}
                {row.topUpGrams > 0 && (
                  <span className="sheet-note block text-sm font-normal">first top up {formatMass(row.topUpGrams, units.mass)} of oil</span>
                )}
              </th>
              <td className={cell.num}>{formatTemp(row.waitForC, units.temp)}</td>
              <td className={`${cell.text} text-sm`}>{row.glazes}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </SheetSection>
  );
}
