import type { ReactNode } from 'react';

/**
 * The palette of the charts, from the theme (SVG fills can't read CSS
 * variables): plum, a toasted sugar, sage and a warm grey, each at least
 * 3:1 against the white card (WCAG 2.1, 1.4.11).
 */
export const chartColors = { now: '#56305f', before: '#b0651a', sold: '#3b6642', capacity: '#8f7f6a' };

/** The charts' words and grid: the theme's ink and muted text (4.5:1 and more on white, WCAG 2.1, 1.4.3), the line colour for the grid. */
export const chartText = { ink: '#2b1830', muted: '#6a5566', grid: '#e2d2b8' };

/**
 * A chart with the table that says the same beside it (below it on a
 * phone): the picture for a quick look, the numbers for reading out.
 */
export function ChartFrame({ id, title, intro, chart, table }: { id: string; title: string; intro?: ReactNode; chart: ReactNode; table: ReactNode }) {
  return (
    <section className="card flex flex-col gap-3" aria-labelledby={id}>
      <h2 id={id} className="text-xl">
        {title}
      </h2>
      {intro && <p className="text-muted">{intro}</p>}
      <div className="grid items-start gap-4 lg:grid-cols-2">
        {/* the charts are drawn with accessibilityLayer={false}, so nothing hidden here takes the focus */}
        <div aria-hidden="true" className="h-64 min-w-0">
          {chart}
        </div>
        {/* a table wider than a phone scrolls sideways, so the keyboard can reach it too */}
        <div className="overflow-x-auto" tabIndex={0} role="region" aria-label={`${title}: the numbers`}>
          {table}
        </div>
      </div>
    </section>
  );
}

export function Th({ children, num }: { children: ReactNode; num?: boolean }) {
  return (
    <th scope="col" className={`border-b border-line px-2 py-1 text-sm text-muted ${num ? 'text-right' : 'text-left'}`}>
      {children}
    </th>
  );
}

export function Td({ children, num, head }: { children: ReactNode; num?: boolean; head?: boolean }) {
  const className = `border-b border-line px-2 py-1 ${num ? 'text-right tabular-nums' : 'text-left'}`;
  return head ? (
    <th scope="row" className={`${className} font-semibold`}>
      {children}
    </th>
  ) : (
    <td className={className}>{children}</td>
  );
}
