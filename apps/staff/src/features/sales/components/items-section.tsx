import type { WeeklyFigures } from '@fryline/schemas';
import { BarChartSection } from './bar-chart-section';
import { Td, Th, chartColors } from './chart-frame';

/** Pieces sold of each menu item, pre-ordered and over the counter. */
export function ItemsSection({ week }: { week: WeeklyFigures }) {
  const rows = week.byItem.map((i) => ({ name: i.name, preorder: i.preorderPieces, walkUp: i.walkUpPieces }));
  return (
    <BarChartSection
      id="items-heading"
      title="What sold"
      intro="Pieces of each item: from pre-orders still standing (paid this week, not cancelled or refunded in full) and from walk-up sales."
      rows={rows}
      category="name"
      series={[
        { key: 'preorder', name: 'Pre-ordered', color: chartColors.now },
        { key: 'walkUp', name: 'Walk-up', color: chartColors.before },
      ]}
      stacked
      across
      empty="Nothing sold this week."
      table={
        <table className="w-full">
          <caption className="sr-only">Pieces sold by menu item</caption>
          <thead>
            <tr>
              <Th>Item</Th>
              <Th>Flavour · glaze</Th>
              <Th num>Orders</Th>
              <Th num>Pre-ordered</Th>
              <Th num>Walk-up</Th>
              <Th num>Pieces</Th>
            </tr>
          </thead>
          <tbody>
            {week.byItem.length === 0 && (
              <tr>
                <td colSpan={6} className="px-2 py-2 text-muted">
                  Nothing sold this week.
                </td>
              </tr>
            )}
            {week.byItem.map((i) => (
              <tr key={i.menuItemId}>
                <Td head>
                  {i.name} <span className="text-sm text-muted">({i.kind})</span>
                </Td>
                <Td>
                  {i.flavour} · {i.glaze}
                </Td>
                <Td num>{i.orders}</Td>
                <Td num>{i.preorderPieces}</Td>
                <Td num>{i.walkUpPieces}</Td>
                <Td num>{i.pieces}</Td>
              </tr>
            ))}
          </tbody>
        </table>
      }
    />
  );
}

/** Pieces by flavour and by glaze, as two small tables. */
export function FlavourGlazeTables({ week }: { week: WeeklyFigures }) {
  if (week.byFlavour.length === 0) return null;
  const table = (caption: string, rows: Array<{ label: string; pieces: number }>) => (
    <table className="w-full">
      <caption className="text-left font-extrabold">{caption}</caption>
      <thead>
        <tr>
          <Th>{caption.replace('By ', '').replace(/^./, (c) => c.toUpperCase())}</Th>
          <Th num>Pieces</Th>
        </tr>
      </thead>
      <tbody>
        {rows.map((r) => (
          <tr key={r.label}>
            <Td head>{r.label}</Td>
            <Td num>{r.pieces}</Td>
          </tr>
        ))}
      </tbody>
    </table>
  );
  return (
    <section className="card grid gap-4 sm:grid-cols-2" aria-label="Pieces by flavour and by glaze">
      {table('By flavour', week.byFlavour.map((f) => ({ label: f.flavour, pieces: f.pieces })))}
      {table('By glaze', week.byGlaze.map((g) => ({ label: g.glaze, pieces: g.pieces })))}
    </section>
  );
}
