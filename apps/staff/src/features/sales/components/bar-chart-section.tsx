import type { ReactNode } from 'react';
import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { ChartFrame, chartText } from './chart-frame';

/** One series of bars: which field of a row it draws, its name in the legend, and its fill. */
export interface BarSeries<Row> {
  key: keyof Row & string;
  name: string;
  color: string;
}

interface BarChartSectionProps<Row> {
  id: string;
  title: string;
  intro?: ReactNode;
  rows: Row[];
  /** The field that names each group of bars (an item, a day, a figure). */
  category: keyof Row & string;
  series: Array<BarSeries<Row>>;
  /** Series drawn one on top of the other (parts of a whole) rather than side by side. */
  stacked?: boolean;
  /** Bars running across, with the names down the side (long names, many rows). */
  across?: boolean;
  /** Said in place of the chart when there are no rows. */
  empty: string;
  /** How a value reads on the axis and in the tooltip (counts as they are by default). */
  formatValue?: (value: number) => string;
  /** The same numbers as a table: the chart is for a quick look only. */
  table: ReactNode;
}

const tick = { fontSize: 12, fill: chartText.muted };

/**
 * A section of the weekly sales: a bar chart and the table that says the
 * same. Legend and axis text are in the theme's ink and muted colours (not
 * the series' fills), and each stacked part is edged in white, so every bar
 * meets the white card at 3:1 or more and every word at 4.5:1 or more
 * (WCAG 2.1, 1.4.11 and 1.4.3; the palette is checked in chart-colors.test.ts).
 */
export function BarChartSection<Row extends object>({ id, title, intro, rows, category, series, stacked, across, empty, formatValue, table }: BarChartSectionProps<Row>) {
  const valueAxis = { tick, allowDecimals: false, tickFormatter: formatValue, width: formatValue ? 76 : 40 };
  return (
    <ChartFrame
      id={id}
      title={title}
      intro={intro}
      chart={
        rows.length === 0 ? (
          <p className="text-muted">{empty}</p>
        ) : (
          <ResponsiveContainer width="100%" height="100%">
            <BarChart accessibilityLayer={false} data={rows} layout={across ? 'vertical' : 'horizontal'} margin={{ left: 8, right: 16 }}>
              <CartesianGrid strokeDasharray="3 3" stroke={chartText.grid} horizontal={!across} vertical={Boolean(across)} />
              {across ? (
                <>
                  <XAxis type="number" {...valueAxis} />
                  <YAxis type="category" dataKey={category as string} width={130} tick={tick} />
                </>
              ) : (
                <>
                  <XAxis dataKey={category as string} tick={tick} interval={0} />
                  <YAxis {...valueAxis} />
                </>
              )}
              <Tooltip formatter={formatValue ? (v) => formatValue(Number(v)) : undefined} />
              <Legend formatter={(name) => <span style={{ color: chartText.ink }}>{name}</span>} />
              {series.map((s) => (
                <Bar key={s.key} dataKey={s.key as string} name={s.name} fill={s.color} stackId={stacked ? 'parts' : undefined} stroke="#ffffff" strokeWidth={stacked ? 1 : 0} />
              ))}
            </BarChart>
          </ResponsiveContainer>
        )
      }
      table={table}
    />
  );
}
