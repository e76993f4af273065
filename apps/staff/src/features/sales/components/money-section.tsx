import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatCents, type WeeklyFigures } from '@fryline/schemas';
import { changePercent } from '../model/week';
import { ChartFrame, Td, Th, chartColors } from './chart-frame';

const rows: Array<[keyof WeeklyFigures, string]> = [
  ['grossCents', 'Gross sales'],
  ['refundsCents', 'Refunds'],
  ['feesCents', 'Card fees'],
  ['netCents', 'Net'],
  ['ingredientCents', 'Ingredients'],
  ['marginCents', 'Margin'],
];

const change = (now: number, before: number) => {
  const p = changePercent(now, before);
  return p === null ? '—' : `${p > 0 ? '+' : ''}${p.toFixed(1)} %`;
};

/** Money in and out this week beside the week before. */
export function MoneySection({ week, previous }: { week: WeeklyFigures; previous: WeeklyFigures }) {
  const data = rows.map(([key, label]) => ({ label, now: (week[key] as number) / 100, before: (previous[key] as number) / 100 }));
  return (
    <ChartFrame
      id="money-heading"
      title="Money"
      intro="Gross is pre-orders paid this week plus walk-up sales; refunds are those made this week; card fees are what the card processor kept. Net = gross − refunds − fees; margin = net − ingredients."
      chart={
        <ResponsiveContainer width="100%" height="100%">
          <BarChart accessibilityLayer={false} data={data} margin={{ left: 8, right: 8 }}>
            <CartesianGrid strokeDasharray="3 3" vertical={false} />
            <XAxis dataKey="label" tick={{ fontSize: 12 }} interval={0} />
            <YAxis tickFormatter={(v: number) => `$${v}`} width={56} />
            <Tooltip formatter={(v) => formatCents(Math.round(Number(v) * 100))} />
            <Legend />
            <Bar dataKey="now" name="This week" fill={chartColors.now} />
            <Bar dataKey="before" name="Week before" fill={chartColors.before} />
          </BarChart>
        </ResponsiveContainer>
      }
      table={
        <table className="w-full">
          <caption className="sr-only">Money this week and the week before</caption>
          <thead>
            <tr>
              <Th>Figure</Th>
              <Th num>This week</Th>
              <Th num>Week before</Th>
              <Th num>Change</Th>
            </tr>
          </thead>
          <tbody>
            {rows.map(([key, label]) => (
              <tr key={key}>
                <Td head>{label}</Td>
                <Td num>{formatCents(week[key] as number)}</Td>
                <Td num>{formatCents(previous[key] as number)}</Td>
                <Td num>{change(week[key] as number, previous[key] as number)}</Td>
              </tr>
            ))}
          </tbody>
        </table>
      }
    />
  );
}
