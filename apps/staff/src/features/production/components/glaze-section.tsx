import type { GlazeAmount } from '@fryline/production';
import { formatPieces } from '@fryline/ui/format';
import { formatMass, type Units } from '../../../lib/units';
import { cell, num, SheetSection, TableHead } from './sheet-section';

/** How much of each glaze to make, and what goes in it. */
export function GlazeSection({ glazes, units }: { glazes: GlazeAmount[]; units: Units }) {
  const mass = (grams: number) => formatMass(grams, units.mass);
  return (
    <SheetSection id="glaze" title="Glaze">
      {glazes.length === 0 ? (
        <p className="text-muted">No glazed pieces on tonight’s orders.</p>
      ) : (
        <table className="w-full">
          <caption className="sr-only">Glaze to make</caption>
          <TableHead columns={['Glaze', num('Make'), 'Parts']} screenOnly />
          <tbody>
            {glazes.map((glaze) => (
              <tr key={glaze.glazeId}>
                <th scope="row" className={`${cell.row} align-top`}>
                  {glaze.name}
                  <span className="sheet-note block text-sm font-normal text-muted">for {formatPieces(glaze.rings, glaze.holes)}</span>
                </th>
                <td className={`${cell.num} align-top`}>
                  <span className="font-extrabold">{mass(glaze.grams)}</span>
                  <span className="block text-sm text-muted" data-print="hide">{mass(glaze.onPiecesGrams)} on pieces</span>
                </td>
                <td className={cell.text}>
                  <ul>
                    {glaze.parts.map((part) => (
                      <li key={part.name} className="sheet-part">
                        <span className="tabular-nums">{mass(part.grams)}</span> {part.name.toLowerCase()}
                      </li>
                    ))}
                  </ul>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </SheetSection>
  );
}
