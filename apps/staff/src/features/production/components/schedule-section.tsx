import type { TimelineEntry } from '@fryline/production';
import { formatMinutes, unitsInText, type Units } from '../../../lib/units';
import { scheduleRows } from '../model/sheet';
import { cell, SheetSection, TableHead } from './sheet-section';

/** The clock-time schedule, worked back from the first pickup, in the bake day's time zone. */
export function ScheduleSection({ timeline, timeZone, units }: { timeline: readonly TimelineEntry[]; timeZone: string; units: Units }) {
  return (
    <SheetSection id="schedule" title="Schedule" wide>
      <table className="w-full">
        <caption className="sr-only">Schedule, in the bake day’s local time</caption>
        <TableHead columns={['When', 'Step, and what to look for']} screenOnly />
        <tbody>
          {scheduleRows(timeline, timeZone).map((row, _, rows) => {
            // A step repeated for each mix checks the same things: on paper, say so instead of printing them again.
            const first = rows.find((r) => r.lookFor === row.lookFor)!;
            const repeat = first !== row;
            // "Build the starter — mix 2" after "Build the starter — mix 1": "as for mix 1" says it all.
            const [step, firstMix] = first.title.split(' — ');
            const sameStep = firstMix !== undefined && row.title.startsWith(`${step} — `);
            return (
              <tr key={row.key}>
                <td className={`${cell.text} tabular-nums`}>
                  <span className="sheet-when block font-extrabold whitespace-nowrap">{row.starts}</span>
                  <span className="sheet-note block text-sm whitespace-nowrap text-muted">to {row.ends}</span>
                  <span className="sheet-note block text-sm whitespace-nowrap text-muted">{formatMinutes(row.minutes)}</span>
                </td>
                <th scope="row" className={`${cell.text} text-left font-normal`}>
                  <span className="sheet-step block font-extrabold">{row.title}</span>
                  <span className={`sheet-look block text-sm${repeat ? ' sheet-hint' : ''}`}>{unitsInText(row.lookFor, units)}</span>
                  {repeat && (
                    <span className="sheet-print-only">{sameStep ? `the same checks as for ${firstMix}.` : `the same checks as ${first.title.toLowerCase()}.`}</span>
                  )}
                </th>
              </tr>
            );
          })}
        </tbody>
      </table>
    </SheetSection>
  );
}
