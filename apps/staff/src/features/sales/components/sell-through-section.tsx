import type { WeeklyFigures } from '@fryline/schemas';
import { formatDate } from '@fryline/ui/format';
import { BarChartSection } from './bar-chart-section';
import { Td, Th, chartColors } from './chart-frame';

/** How much of each bake day's capacity was sold, in advance and at the stall. */
export function SellThroughSection({ week }: { week: WeeklyFigures }) {
  const label = (date: string) => formatDate(date, week.week.timeZone, 'short');
  const rows = week.sellThrough.map((d) => ({ day: label(d.date), sold: d.sold, unsold: Math.max(d.capacity - d.sold, 0) }));
  return (
    <BarChartSection
      id="sell-through-heading"
      title="Sell-through"
      intro="Each bake day of the week: pieces sold (pre-orders paid, collected or not, plus walk-ups) against its capacity."
      rows={rows}
      category="day"
      series={[
        { key: 'sold', name: 'Sold', color: chartColors.sold },
        { key: 'unsold', name: 'Not sold', color: chartColors.capacity },
      ]}
      stacked
      empty="No bake day this week."
      table={
        <table className="w-full">
          <caption className="sr-only">Sell-through by bake day</caption>
          <thead>
            <tr>
              <Th>Bake day</Th>
              <Th num>Capacity</Th>
              <Th num>Pre-ordered</Th>
              <Th num>Walk-up</Th>
              <Th num>Sold</Th>
            </tr>
          </thead>
          <tbody>
            {week.sellThrough.map((d) => (
              <tr key={d.bakeDayId}>
                <Td head>
                  {label(d.date)} <span className="text-sm text-muted">{d.place}</span>
                  {d.calledOff && <span className="badge badge-bad ml-1">called off</span>}
                </Td>
                <Td num>{d.capacity}</Td>
                <Td num>{d.preorderPieces}</Td>
                <Td num>{d.walkUpPieces}</Td>
                <Td num>{d.percent === null ? d.sold : `${d.sold} (${d.percent.toFixed(1)} %)`}</Td>
              </tr>
            ))}
          </tbody>
        </table>
      }
    />
  );
}
