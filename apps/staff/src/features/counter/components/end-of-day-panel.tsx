import { useQuery } from '@tanstack/react-query';

import { formatPieces, plural } from '@fryline/ui/format';
import { ErrorState, LoadingState, useMoney } from '@fryline/ui';
import { counterQueries } from '../api/counter-queries';
import { restForNoShow, type ShownRow } from '../model/pickups';
import { RestNoShowButton } from './rest-no-show';
import { useOnline } from './use-online';
import { CounterSettingsForm } from './counter-settings-form';
import { hasRole } from '@fryline/schemas';
import { useStaffMember } from '../../../app/session/staff-member';

function Figure({ label, value, detail }: { label: string; value: string; detail?: string }) {
  return (
    <div className="flex items-baseline justify-between gap-3 border-b border-line py-2">
      <dt className="font-semibold">{label}</dt>
      <dd className="text-right">
        <span className="text-lg font-extrabold">{value}</span>
        {detail && <span className="block text-sm text-muted">{detail}</span>}
      </dd>
    </div>
  );
}

/** The day's close: what was handed over, no-shows, walk-ups by how they were paid, the cash to count, what is left. */
export function EndOfDayPanel({ bakeDayId, rows, now }: { bakeDayId: string; rows: ShownRow[]; now: number }) {
  const money = useMoney();
  const eod = useQuery({ ...counterQueries.endOfDay(bakeDayId), refetchInterval: 10_000 });
  const online = useOnline();
  const member = useStaffMember();
  if (eod.isPending) return <LoadingState label="Adding up the day…" />;
  if (eod.isError && !eod.data) return <ErrorState error={eod.error} title="The day’s figures could not be loaded" onRetry={() => void eod.refetch()} />;
  const d = eod.data!;
  const left = d.leftOver.items.filter((i) => i.left > 0);
  return (
    <div className="flex flex-col gap-4">
      {!online && <p className="notice notice-warn">Offline: these are the figures from the last time this phone was online.</p>}
      <section aria-labelledby="cash-heading" className="card bg-sugar-100">
        <h2 id="cash-heading" className="text-lg">
          Cash to count in the box
        </h2>
        <p className="text-4xl font-extrabold" data-testid="cash-to-count">
          {money(d.cashToCountCents)}
        </p>
        <p className="text-muted">From {plural(d.walkUps.byMethod.cash.sales, 'cash walk-up sale')}, on top of the float you started with.</p>
      </section>
      <dl className="card">
        <Figure label="Handed over" value={plural(d.orders.handedOver, 'order')} detail={formatPieces(d.pieces.handedOver.rings, d.pieces.handedOver.holes)} />
        <Figure label="Still to hand over" value={plural(d.orders.toHandOver, 'order')} detail={formatPieces(d.pieces.toHandOver.rings, d.pieces.toHandOver.holes)} />
        <Figure label="No-shows" value={plural(d.orders.noShows, 'order')} detail={formatPieces(d.pieces.noShows.rings, d.pieces.noShows.holes)} />
        <Figure label="Walk-up sales" value={money(d.walkUps.totalCents)} detail={`${plural(d.walkUps.sales, 'sale')}: ${formatPieces(d.walkUps.rings, d.walkUps.holes)}`} />
        <Figure label="Paid by cash" value={money(d.walkUps.byMethod.cash.amountCents)} detail={plural(d.walkUps.byMethod.cash.sales, 'sale')} />
        <Figure label="Paid by card" value={money(d.walkUps.byMethod.card.amountCents)} detail={`${plural(d.walkUps.byMethod.card.sales, 'sale')}, on the card reader`} />
      </dl>
      <section aria-labelledby="left-heading" className="card">
        <h2 id="left-heading" className="text-lg">
          Left over: {formatPieces(d.leftOver.rings, d.leftOver.holes)}
        </h2>
        {left.length > 0 && (
          <ul className="mt-2">
            {left.map((i) => (
              <li key={i.menuItemId}>
                {i.left} {i.name}
              </li>
            ))}
          </ul>
        )}
      </section>
      <RestNoShowButton bakeDayId={bakeDayId} rest={restForNoShow(rows, now)} />
      {hasRole(member.role, 'owner') && <CounterSettingsForm />}
    </div>
  );
}
