import { useQuery } from '@tanstack/react-query';
import { normalisePickupCode, PICKUP_CODE_LENGTH, type OrderByCode } from '@fryline/schemas';
import { errorMessage, isApiError } from '@fryline/ui/api-client';
import { formatClockRange, formatDate } from '@fryline/ui/format';
import { counterQueries } from '../api/counter-queries';
import { boxText, type ShownRow } from '../model/pickups';
import { PickupCard, type CardActions } from './pickup-card';
import { ModalDialog } from '@fryline/ui';

/** What was asked for: an order of this day's list, or a code to look up on the server. */
export type Lookup = { kind: 'row'; orderId: string } | { kind: 'code'; code: string };

/** True when what was typed is a whole pickup code. */
export const isWholeCode = (text: string) => normalisePickupCode(text).length === PICKUP_CODE_LENGTH;

function OtherOrder({ order, bakeDayId }: { order: OrderByCode; bakeDayId: string }) {
  const sameDay = order.bakeDayId === bakeDayId;
  return (
    <>
      <p className="font-mono text-lg font-bold tracking-[0.15em]">{order.pickupCode}</p>
      <ul>
        {order.boxes.map((box, i) => (
          <li key={i}>{boxText(box)}</li>
        ))}
      </ul>
      {!sameDay && (
        <p className="notice notice-warn">
          This order is for {formatDate(order.bakeDay.date, order.bakeDay.timeZone)}, {formatClockRange(order.window.startsAt, order.window.endsAt, order.bakeDay.timeZone)}, at {order.bakeDay.place}: not this bake day. Don’t hand it over today.
        </p>
      )}
    </>
  );
}

/** The order a scan or a typed code found, in a panel at the bottom of the screen. */
export function FoundOrder({
  lookup, rows, bakeDayId, timeZone, now, actions, onClose,
}: {
  lookup: Lookup;
  rows: readonly ShownRow[];
  bakeDayId: string;
  timeZone: string;
  now: number;
  actions: CardActions;
  onClose: () => void;
}) {
  const code = lookup.kind === 'code' ? normalisePickupCode(lookup.code) : '';
  const row = lookup.kind === 'row' ? rows.find((r) => r.orderId === lookup.orderId) : rows.find((r) => r.pickupCode === code);
  const remote = useQuery({ ...counterQueries.byCode(code), enabled: !row && code !== '' });
  const close = (act: (r: ShownRow) => void) => (r: ShownRow) => {
    act(r);
    onClose();
  };

  if (row) {
    return (
      <ModalDialog title={row.name} onClose={onClose}>
        <div className="mt-3 flex flex-col gap-3">
        <PickupCard row={row} now={now} timeZone={timeZone} actions={{ ...actions, handOver: close(actions.handOver), noShow: close(actions.noShow) }} />
        <button type="button" className="btn btn-quiet min-h-12" onClick={onClose}>
          Close
        </button>
        </div>
      </ModalDialog>
    );
  }
  return (
    <ModalDialog title={remote.data ? remote.data.name : `Code ${code}`} onClose={onClose}>
      <div className="mt-3 flex flex-col gap-3">
      {remote.isPending && <p role="status">Looking up {code}…</p>}
      {remote.isError && (
        <p role="alert" className="notice notice-bad">
          {isApiError(remote.error) && remote.error.status === 404 ? `No order has the code ${code}. Check it with the customer, or search by name.` : errorMessage(remote.error)}
        </p>
      )}
      {remote.data && <OtherOrder order={remote.data} bakeDayId={bakeDayId} />}
      <button type="button" className="btn btn-quiet min-h-12" onClick={onClose}>
        Close
      </button>
      </div>
    </ModalDialog>
  );
}
