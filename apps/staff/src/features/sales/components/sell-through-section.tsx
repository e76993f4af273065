import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { WeeklyFigures } from '@fryline/schemas';
import { formatDate } from '@fryline/ui/format';
import { ChartFrame, Td, Th, chartColors } from './chart-frame';

/** How much of each bake day's capacity was sold, in advance and at the stall. */
export function SellThroughSection({ week }: { week: WeeklyFigures }) {
  const label = (date: string) => formatDate(date, week.week.timeZone, 'short');
  const data = week.sellThrough.map((d) => ({ day: label(d.date), sold: d.sold, unsold: Math.max(d.capacity - d.sold, 0) }));
  return (
    <ChartFrame
      id="sell-through-heading"
      title="Sell-through"
      intro="Each bake day of the week: pieces sold (pre-orders paid, collected or not, plus walk-ups) against its capacity."
      chart={
        data.length === 0 ? (
          <p className="text-muted">No bake day this week.</p>
        ) : (
          <ResponsiveContainer width="100%" height="100%">
            <BarChart accessibilityLayer={false} data={data} margin={{ left: 8, right: 8 }}>
              <CartesianGrid strokeDasharray="3 3" vertical={false} />
              <XAxis dataKey="day" />
              <YAxis allowDecimals={false} />
              <Tooltip />
              <Legend />
              <Bar dataKey="sold" name="Sold" stackId="day" fill={chartColors.sold} />
              <Bar dataKey="unsold" name="Not sold" stackId="day" fill={chartColors.capacity} />
            </BarChart>
          </ResponsiveContainer>
        )
      }
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
