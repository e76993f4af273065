import { useState } from 'react';
import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { WeeklyFigures } from '@fryline/schemas';
import { PageFrame } from '../../../components/page-frame';
import { ErrorState, LoadingState, useMoney } from '@fryline/ui';
import { formatDate, plural } from '@fryline/ui/format';
import { salesQueries, weeklyCsvUrl } from '../api/sales-queries';
import { mondayOf, shiftWeek, todayHere } from '../model/week';
import { MoneySection } from './money-section';
import { FlavourGlazeTables, ItemsSection } from './items-section';
import { SellThroughSection } from './sell-through-section';
import { Td, Th } from './chart-frame';

function Figure({ label, value, before }: { label: string; value: string; before: string }) {
  return (
    <div className="rounded-2xl border border-line bg-white p-3">
      <dt className="text-sm font-extrabold text-muted">{label}</dt>
      <dd className="text-2xl font-extrabold tabular-nums">{value}</dd>
      <dd className="text-sm text-muted">Week before: {before}</dd>
    </div>
  );
}

function Headline({ week, previous }: { week: WeeklyFigures; previous: WeeklyFigures }) {
  const money = useMoney();
  const perPiece = (f: WeeklyFigures) => (f.costPerPieceCents === null ? '—' : money(f.costPerPieceCents));
  return (
    <dl className="grid grid-cols-2 gap-3 md:grid-cols-4">
      <Figure label="Net" value={money(week.netCents)} before={money(previous.netCents)} />
      <Figure label="Orders" value={String(week.orders)} before={String(previous.orders)} />
      <Figure label="Pieces pre-ordered" value={String(week.pieces)} before={String(previous.pieces)} />
      <Figure label="No-shows" value={String(week.noShows)} before={String(previous.noShows)} />
      <Figure label="Walk-up sales" value={money(week.walkUps.cents)} before={money(previous.walkUps.cents)} />
      <Figure label="Ingredient cost per piece" value={perPiece(week)} before={perPiece(previous)} />
      <Figure label="Margin" value={money(week.marginCents)} before={money(previous.marginCents)} />
      <Figure label="Card fees" value={money(week.feesCents)} before={money(previous.feesCents)} />
    </dl>
  );
}

function WalkUpsTable({ week, previous }: { week: WeeklyFigures; previous: WeeklyFigures }) {
  const money = useMoney();
  const methods = ['cash', 'card'] as const;
  const find = (f: WeeklyFigures, m: (typeof methods)[number]) => f.walkUps.byMethod.find((x) => x.method === m) ?? { sales: 0, cents: 0 };
  return (
    <section className="card flex flex-col gap-2" aria-labelledby="walk-ups-heading">
      <h2 id="walk-ups-heading" className="text-xl">
        Walk-up sales
      </h2>
      <p className="text-muted">
        {plural(week.walkUps.sales, 'sale')} of surplus at the stall, {plural(week.walkUps.pieces, 'piece')}. No-shows this week:{' '}
        {plural(week.noShows, 'order')} ({plural(week.noShowPieces, 'piece')}).
      </p>
      <table className="w-full max-w-xl">
        <caption className="sr-only">Walk-up sales by how they were paid</caption>
        <thead>
          <tr>
            <Th>Paid by</Th>
            <Th num>Sales</Th>
            <Th num>This week</Th>
            <Th num>Week before</Th>
          </tr>
        </thead>
        <tbody>
          {methods.map((m) => (
            <tr key={m}>
              <Td head>{m === 'cash' ? 'Cash' : 'Card'}</Td>
              <Td num>{find(week, m).sales}</Td>
              <Td num>{money(find(week, m).cents)}</Td>
              <Td num>{money(find(previous, m).cents)}</Td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}

/** `/staff/sales`: one week's sales beside the week before, with charts, tables and a CSV. */
export default function SalesPage() {
  const [monday, setMonday] = useState(() => mondayOf(todayHere()));
  const report = useQuery({ ...salesQueries.weekly(monday), placeholderData: keepPreviousData });
  const thisWeek = mondayOf(todayHere());

  return (
    <PageFrame eyebrow="Owner" title="Sales" intro="How each week went, in money and in doughnuts, Monday to Sunday in the shop’s time zone.">
      <nav aria-label="Week" className="flex flex-wrap items-center gap-2">
        <button type="button" className="btn btn-quiet btn-small" onClick={() => setMonday(shiftWeek(monday, -1))}>
          <span aria-hidden="true">← </span>Week before
        </button>
        <label className="flex items-center gap-2 font-extrabold">
          Week of
          <input
            type="date"
            className="field-input w-auto"
            value={monday}
            onChange={(e) => e.target.value && setMonday(mondayOf(e.target.value))}
          />
        </label>
        <button type="button" className="btn btn-quiet btn-small" disabled={monday >= thisWeek} onClick={() => setMonday(shiftWeek(monday, 1))}>
          Week after<span aria-hidden="true"> →</span>
        </button>
        <a className="btn btn-primary btn-small ml-auto" href={weeklyCsvUrl(monday)} download>
          Download CSV
        </a>
      </nav>
      {report.isPending ? (
        <LoadingState label="Adding up the week…" />
      ) : report.isError ? (
        <ErrorState error={report.error} title="The week's sales could not be loaded" onRetry={() => void report.refetch()} />
      ) : (
        <>
          <p className="text-muted" aria-live="polite">
            {formatDate(report.data.week.start, report.data.week.timeZone)} to {formatDate(report.data.week.end, report.data.week.timeZone)} (
            {report.data.week.timeZone.replace(/_/g, ' ')}).
          </p>
          <Headline week={report.data} previous={report.data.previous} />
          <MoneySection week={report.data} previous={report.data.previous} />
          <ItemsSection week={report.data} />
          <FlavourGlazeTables week={report.data} />
          <SellThroughSection week={report.data} />
          <WalkUpsTable week={report.data} previous={report.data.previous} />
          {report.data.notes.length > 0 && (
            <div className="notice notice-warn">
              {report.data.notes.map((n) => (
                <p key={n}>{n}</p>
              ))}
            </div>
          )}
          <p className="text-sm text-muted">
            Ingredient cost comes from the production costing: each piece at its production-sheet cost (dough, frying fat, glaze) with the
            prices on the Equipment page.
          </p>
        </>
      )}
    </PageFrame>
  );
}
