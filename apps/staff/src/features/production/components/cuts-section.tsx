import type { CutsPlan } from '@fryline/production';
import { formatPieces } from '@fryline/ui/format';
import { formatMass, type Units } from '../../../lib/units';
import { cell, Facts, num, SheetSection, TableHead } from './sheet-section';

/** How many rings and holes each roll gives, and what is left over. */
export function CutsSection({ cuts, units }: { cuts: CutsPlan; units: Units }) {
  const mass = (grams: number) => formatMass(grams, units.mass);
  const sheet = cuts.firstRollSheet;
  return (
    <SheetSection id="cuts" title="Cutting">
      <table className="w-full">
        <caption className="sr-only">Rings and holes per roll</caption>
        <TableHead columns={['Roll', num('Dough'), num('Rings'), num('Extra holes'), num('Scraps')]} />
        <tbody>
          {cuts.rolls.map((roll) => (
            <tr key={roll.roll}>
              <th scope="row" className={cell.row}>
                {roll.roll === 1 ? 'First roll' : cuts.rolls.length > 2 ? `Re-roll ${roll.roll - 1}` : 'Re-roll'}
              </th>
              <td className={cell.num}>{mass(roll.doughGrams)}</td>
              <td className={cell.num}>{roll.rings}</td>
              <td className={cell.num}>{roll.extraHoles}</td>
              <td className={cell.num}>{mass(roll.scrapGrams)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <Facts
        facts={[
          { label: 'Rings cut', value: cuts.rings },
          { label: 'Holes', value: cuts.holes, note: `${cuts.holes - cuts.extraHoles} ring centres, ${cuts.extraHoles} cut extra` },
          {
            label: 'Surplus for walk-ups',
            value: formatPieces(cuts.surplus.rings, cuts.surplus.holes),
            note: 'cut beyond the pieces to make',
          },
          sheet.lengthMm > 0 && {
            label: 'First roll',
            value: `${Math.round(sheet.widthMm)} × ${Math.round(sheet.lengthMm)} mm`,
            note: `${sheet.ringsThatFit} rings fit on it`,
          },
        ]}
      />
    </SheetSection>
  );
}
