import { useMemo, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import type { BakeDayView, Surplus } from '@fryline/schemas';
import { ErrorState, LoadingState } from '@fryline/ui';
import { formatDate } from '@fryline/ui/format';
import { useStaffMember } from '../../../app/session/staff-member';
import { counterQueries, defaultBakeDay } from '../api/counter-queries';
import { useOrderChange, useWaitingChanges, type OrderChange, type WalkUpChange } from '../api/counter-mutations';
import { withPending, type ShownRow } from '../model/pickups';
import { ConflictList } from './conflict-list';
import { EndOfDayPanel } from './end-of-day-panel';
import type { Lookup } from './find-order';
import type { CardActions } from './pickup-card';
import { PickupList } from './pickup-list';
import { StatusIcon } from './status-icon';
import { useNow } from './use-now';
import { useOnline } from './use-online';
import { WalkUpForm } from './walk-up-form';

const views = [
  { id: 'pickups', label: 'Pickups' },
  { id: 'walk-up', label: 'Walk-up sale' },
  { id: 'end-of-day', label: 'End of day' },
] as const;
type View = (typeof views)[number]['id'];

/** Left per item less the walk-ups still waiting on this phone. */
function surplusAfterWaiting(surplus: Surplus, waiting: WalkUpChange[]): Surplus {
  const taken = new Map<string, number>();
  for (const sale of waiting) for (const i of sale.items) taken.set(i.menuItemId, (taken.get(i.menuItemId) ?? 0) + i.quantity);
  const items = surplus.items.map((i) => ({ ...i, left: Math.max(0, i.left - (taken.get(i.menuItemId) ?? 0)) }));
  const sum = (kind: string) => items.filter((i) => i.kind === kind).reduce((n, i) => n + i.left, 0);
  return { items, rings: sum('ring'), holes: sum('hole') };
}

function DayPicker({ days, value, onChange }: { days: BakeDayView[]; value: string; onChange: (id: string) => void }) {
  return (
    <label className="flex flex-col gap-1">
      <span className="text-sm font-extrabold text-muted">Bake day</span>
      <select className="field-input min-h-12" value={value} onChange={(e) => onChange(e.target.value)}>
        {days.map((d) => (
          <option key={d.id} value={d.id}>
            {formatDate(d.date, d.timeZone)} · {d.place}
          </option>
        ))}
      </select>
    </label>
  );
}

function CounterDay({ day, view, onView }: { day: BakeDayView; view: View; onView: (view: View) => void }) {
  const [lookup, setLookup] = useState<Lookup | null>(null);
  const member = useStaffMember();
  const now = useNow(1000);
  const online = useOnline();
  const pickups = useQuery(counterQueries.pickups(day.id));
  // loaded on every view, so what is left is on the phone before the signal goes
  const surplus = useQuery(counterQueries.surplus(day.id));
  const waiting = useWaitingChanges();
  const settings = useQuery(counterQueries.settings());
  const { change } = useOrderChange();

  const rows: ShownRow[] = useMemo(() => {
    const pending = waiting.filter((w) => w.key === 'order-change').map((w) => w.variables as OrderChange).filter((v) => v.bakeDayId === day.id);
    return withPending(pickups.data ?? [], pending, settings.data?.handOverUndoSeconds);
  }, [pickups.data, waiting, day.id, settings.data]);

  const act = (action: OrderChange['action']) => (row: ShownRow) => change({ action, orderId: row.orderId, bakeDayId: day.id, by: member.name, name: row.name });
  const actions: CardActions = { handOver: act('collect'), undo: act('uncollect'), noShow: act('no-show'), reverseNoShow: act('reverse-no-show') };

  if (pickups.isPending) return <LoadingState label="Loading the pickup list…" />;
  if (pickups.isError && !pickups.data) return <ErrorState error={pickups.error} title="The pickup list could not be loaded" onRetry={() => void pickups.refetch()} />;

  return (
    <>
      {!online && (
        <p className="notice notice-warn flex items-center gap-2" role="status">
          <StatusIcon name="offline" /> No connection. Keep going: hand-overs and sales wait on this phone and are sent when it is back.
        </p>
      )}
      <ConflictList
        onShow={(orderId) => {
          onView('pickups');
          setLookup({ kind: 'row', orderId });
        }}
      />
      {view === 'pickups' && <PickupList day={day} rows={rows} now={now} actions={actions} lookup={lookup} onLookup={setLookup} />}
      {view === 'walk-up' &&
        (surplus.data ? (
          <WalkUpForm bakeDayId={day.id} surplus={surplusAfterWaiting(surplus.data, waiting.filter((w) => w.key === 'walk-up').map((w) => w.variables as WalkUpChange))} />
        ) : surplus.isError ? (
          <ErrorState error={surplus.error} title="What is left could not be loaded" onRetry={() => void surplus.refetch()} />
        ) : (
          <LoadingState label="Counting what is left…" />
        ))}
      {view === 'end-of-day' && <EndOfDayPanel bakeDayId={day.id} rows={rows} now={now} />}
    </>
  );
}

/** The counter on bake day, made for a phone held in one hand. */
export default function CounterScreen() {
  const [params, setParams] = useSearchParams();
  const days = useQuery(counterQueries.days());
  const view: View = views.some((v) => v.id === params.get('view')) ? (params.get('view') as View) : 'pickups';
  const all = useMemo(() => [...(days.data?.upcoming ?? []), ...(days.data?.past ?? [])], [days.data]);
  const chosen = all.find((d) => d.id === params.get('day')) ?? defaultBakeDay(days.data?.upcoming ?? [], new Date()) ?? days.data?.past[0];
  const set = (key: string, value: string) =>
    setParams(
      (p) => {
        p.set(key, value);
        return p;
      },
      { replace: true },
    );

  return (
    <section className="mx-auto flex w-full max-w-xl flex-col gap-4" aria-labelledby="page-heading">
      <title>Pickups · Fryline staff</title>
      <h1 id="page-heading" tabIndex={-1} className="text-2xl">
        {chosen ? `Pickups · ${formatDate(chosen.date, chosen.timeZone, 'short')}` : 'Pickups'}
      </h1>
      {days.isPending && <LoadingState label="Finding today’s bake day…" />}
      {days.isError && !days.data && <ErrorState error={days.error} title="The bake days could not be loaded" onRetry={() => void days.refetch()} />}
      {days.data && !chosen && <p className="notice">There is no bake day to hand over today.</p>}
      {chosen && (
        <>
          <DayPicker days={all} value={chosen.id} onChange={(id) => set('day', id)} />
          <nav aria-label="Counter" className="grid grid-cols-3 gap-1 rounded-full bg-crumb p-1">
            {views.map((v) => (
              <button
                key={v.id}
                type="button"
                aria-current={view === v.id ? 'page' : undefined}
                className={`min-h-12 rounded-full px-2 text-[0.95rem] font-extrabold ${view === v.id ? 'bg-plum-800 text-paper' : 'text-ink'}`}
                onClick={() => set('view', v.id)}
              >
                {v.label}
              </button>
            ))}
          </nav>
          <CounterDay key={chosen.id} day={chosen} view={view} onView={(v) => set('view', v)} />
        </>
      )}
    </section>
  );
}
