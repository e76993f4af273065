import type { ReactNode } from 'react';

/** One block of the sheet: a card with its own heading, kept whole on paper. */
export function SheetSection({
  id,
  title,
  wide = false,
  screenOnly = false,
  children,
}: {
  id: string;
  title: string;
  /** Spans both columns on a wide screen. */
  wide?: boolean;
  /** Left off the printed sheet. */
  screenOnly?: boolean;
  children: ReactNode;
}) {
  return (
    <section
      aria-labelledby={`${id}-heading`}
      className={`card sheet-section flex flex-col gap-3 ${wide ? 'lg:col-span-2' : ''}`}
      data-print={screenOnly ? 'hide' : undefined}
    >
      <h2 id={`${id}-heading`} className="text-xl">
        {title}
      </h2>
      {children}
    </section>
  );
}

export interface Fact {
  label: string;
  value: ReactNode;
  /** A figure that goes with the value, printed beside it on paper. */
  note?: ReactNode;
  /** A word of explanation, left off the printed sheet. */
  hint?: ReactNode;
  /** The whole fact is left off the printed sheet (it repeats a figure printed elsewhere). */
  screenOnly?: boolean;
}

/** Label–value pairs, two to a row where there is room. */
export function Facts({ facts }: { facts: readonly (Fact | false | null | undefined)[] }) {
  return (
    <dl className="sheet-facts grid grid-cols-2 gap-x-4 gap-y-2">
      {facts.filter((fact): fact is Fact => Boolean(fact)).map((fact) => (
        <div key={fact.label} className={fact.screenOnly ? 'sheet-hint' : undefined}>
          <dt className="text-sm font-extrabold text-muted">{fact.label}</dt>
          <dd className="font-semibold tabular-nums">{fact.value}</dd>
          {fact.note && <dd className="sheet-note text-sm text-muted">{fact.note}</dd>}
          {fact.hint && <dd className="sheet-hint text-sm text-muted">{fact.hint}</dd>}
        </div>
      ))}
    </dl>
  );
}

/** Table cell classes shared by the sheet's tables. */
export const cell = {
  head: 'border-b border-line py-1.5 pr-3 text-left text-sm font-extrabold text-muted last:pr-0',
  headNum: 'border-b border-line py-1.5 pr-3 text-right text-sm font-extrabold text-muted last:pr-0',
  row: 'border-b border-line py-1.5 pr-3 text-left font-semibold last:pr-0',
  text: 'border-b border-line py-1.5 pr-3 align-top last:pr-0',
  num: 'border-b border-line py-1.5 pr-3 text-right tabular-nums whitespace-nowrap last:pr-0',
} as const;

/** A column of a sheet table: its heading, right-aligned for figures; null leaves the row-heading column blank. */
export type Column = string | { label: string; numeric: true } | null;

/** The heading row of a sheet table. `screenOnly` leaves it off paper, where the rows speak for themselves. */
export function TableHead({ columns, screenOnly = false }: { columns: readonly Column[]; screenOnly?: boolean }) {
  return (
    <thead className={screenOnly ? 'sheet-screen-head' : undefined}>
      <tr>
        {columns.map((column, i) =>
          column === null ? (
            <td key={i} className={cell.head} />
          ) : (
            <th key={i} scope="col" className={typeof column === 'string' ? cell.head : cell.headNum}>
              {typeof column === 'string' ? column : column.label}
            </th>
          ),
        )}
      </tr>
    </thead>
  );
}

/** A figure column. */
export const num = (label: string): Column => ({ label, numeric: true });
