import { useMoney } from '@fryline/ui';
import type { WeeklyFigures } from '@fryline/schemas';
import { changePercent } from '../model/week';
import { BarChartSection } from './bar-chart-section';
import { Td, Th, chartColors } from './chart-frame';

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
  const money = useMoney();
  const data = rows.map(([key, label]) => ({ label, now: week[key] as number, before: previous[key] as number }));
  return (
    <BarChartSection
      id="money-heading"
      title="Money"
      intro="Gross is pre-orders paid this week plus walk-up sales; refunds are those made this week; card fees are what the card processor kept. Net = gross − refunds − fees; margin = net − ingredients."
      rows={data}
      category="label"
      series={[
        { key: 'now', name: 'This week', color: chartColors.now },
        { key: 'before', name: 'Week before', color: chartColors.before },
      ]}
      empty="No money figures this week."
      formatValue={(cents) => money(Math.round(cents))}
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
                <Td num>{money(week[key] as number)}</Td>
                <Td num>{money(previous[key] as number)}</Td>
                <Td num>{change(week[key] as number, previous[key] as number)}</Td>
              </tr>
            ))}
          </tbody>
        </table>
      }
    />
  );
}
