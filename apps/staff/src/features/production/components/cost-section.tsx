import { useQuery } from '@tanstack/react-query';
import { useMoney } from '@fryline/ui';
import type { CostPlan } from '@fryline/production';

import { formatPercent } from '../../../lib/units';
import { settingsQueries } from '../../../lib/queries/settings-queries';
import { cell, num, SheetSection, TableHead } from './sheet-section';

type PieceCosts = CostPlan['perPiece'];

/** One dough's cost per piece: plain, then with each glaze. */
function PieceCostTable({ title, perPiece, glazeNames, visibleTitle }: { title: string; perPiece: PieceCosts; glazeNames: Map<string, string>; visibleTitle: boolean }) {
  const money = useMoney();
  return (
    <table className="w-full">
      <caption className={visibleTitle ? 'text-left font-semibold' : 'sr-only'}>{title}</caption>
      <TableHead columns={['Per piece', num('Ring'), num('Hole')]} />
      <tbody>
        {perPiece.map((piece) => (
          <tr key={piece.glazeId ?? 'plain'}>
            <th scope="row" className={cell.row}>
              {piece.glazeId === null ? 'Plain' : glazeNames.get(piece.glazeId) ?? piece.glazeId}
            </th>
            <td className={cell.num}>{money(piece.ringCents)}</td>
            <td className={cell.num}>{money(piece.holeCents)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** What a ring, a hole (in each dough) and each box cost to make, and the margin (owner only). */
export function CostSection({ cost }: { cost: CostPlan }) {
  const money = useMoney();
  const settings = useQuery(settingsQueries.current());
  const glazeNames = new Map(settings.data?.glazes.map((g) => [g.id, g.name]));
  const flavoured = cost.perDough.length > 0;
  return (
    <SheetSection id="cost" title="Cost and margin" screenOnly>
      <PieceCostTable title={flavoured ? 'Base dough, cost per piece' : 'Cost per piece'} visibleTitle={flavoured} perPiece={cost.perPiece} glazeNames={glazeNames} />
      {cost.perDough.map((dough) => (
        <PieceCostTable key={dough.dough} title={`${dough.name}, cost per piece`} visibleTitle perPiece={dough.perPiece} glazeNames={glazeNames} />
      ))}
      {cost.boxes.length > 0 && (
        <table className="w-full">
          <caption className="sr-only">Margin per box</caption>
          <TableHead columns={['Box', num('Price'), num('Cost'), num('Margin')]} />
          <tbody>
            {cost.boxes.map((box) => (
              <tr key={box.id}>
                <th scope="row" className={cell.row}>
                  {box.name}
                </th>
                <td className={cell.num}>{money(box.priceCents)}</td>
                <td className={cell.num}>{money(box.costCents)}</td>
                <td className={cell.num}>
                  {money(box.marginCents)}
                  {box.marginPercent !== null && (
                    <span className="block text-sm text-muted">{formatPercent(box.marginPercent, 0)}</span>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <p className="text-sm text-muted">
        Box costs count plain pieces of the base dough. Tonight’s dough costs {money(cost.doughCents)}. {cost.rounding}
      </p>
      {cost.missingPrices.length > 0 && (
        <p className="text-sm">
          No price entered for {cost.missingPrices.join(', ')}: counted as free, so these costs are too low. Ingredient prices are set on the Equipment page.
        </p>
      )}
    </SheetSection>
  );
}
