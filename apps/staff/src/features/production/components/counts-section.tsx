import type { BakePlan } from '@fryline/production';
import type { PlanMeta } from '@fryline/schemas';
import { countRows } from '../model/sheet';
import { cell, num, SheetSection, TableHead } from './sheet-section';

const rowLabels = { ordered: 'Ordered', spare: 'Extra for seconds', toMake: 'To make' } as const;

const limitWords: Record<BakePlan['capacity']['limitedBy'], string> = {
  fry: 'the frying time',
  'proofing-trays': 'the proofing trays',
  mixer: 'the mixer',
  fridge: 'the fridge space',
};

/** Tonight's orders by menu item and glaze, and the rings and holes to make with the spare. */
export function CountsSection({ plan, meta }: { plan: BakePlan; meta: PlanMeta }) {
  const rows = countRows(plan, meta);
  const { rings, holes } = plan.pieces;
  return (
    <SheetSection id="counts" title="Counts">
      {rows.length === 0 ? (
        <p className="text-muted">No doughnuts are ordered yet.</p>
      ) : (
        <table className="w-full">
          <caption className="sr-only">Ordered by menu item</caption>
          <TableHead columns={['Menu item', 'Glaze', num('Ordered')]} />
          <tbody>
            {rows.map((row) => (
              <tr key={row.menuItemId}>
                <th scope="row" className={cell.row}>
                  {row.name} <span className="text-sm font-normal text-muted">({row.kind === 'ring' ? 'rings' : 'holes'})</span>
                </th>
                <td className={cell.text}>{row.glaze}</td>
                <td className={cell.num}>{row.quantity}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <table className="w-full">
        <caption className="sr-only">Rings and holes to make</caption>
        <TableHead columns={[null, num('Rings'), num('Holes')]} />
        <tbody>
          {(['ordered', 'spare', 'toMake'] as const).map((key) => {
            const strong = key === 'toMake' ? ' font-extrabold' : '';
            return (
              <tr key={key}>
                <th scope="row" className={cell.row + strong}>
                  {rowLabels[key]}
                </th>
                <td className={cell.num + strong}>{rings[key]}</td>
                <td className={cell.num + strong}>{holes[key]}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <p className="sheet-note text-sm text-muted">
        Extra for seconds replaces misshapen, dropped or over-fried pieces; the surplus for walk-ups (under
        Cutting) is what the dough gives beyond that.
      </p>
      <p className="text-sm text-muted" data-print="hide">
        The equipment makes about {plan.capacity.pieces} rings a bake day (limited by{' '}
        {limitWords[plan.capacity.limitedBy]}); this bake day takes orders for up to {meta.bakeDay.capacity.rings} rings
        and {meta.bakeDay.capacity.holes} holes.
      </p>
    </SheetSection>
  );
}
