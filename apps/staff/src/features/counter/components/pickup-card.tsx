import { formatClock } from '@fryline/ui/format';
import { boxText, rowState, undoSecondsLeft, type RowState, type ShownRow } from '../model/pickups';
import { StatusIcon } from './status-icon';

export interface CardActions {
  handOver(row: ShownRow): void;
  undo(row: ShownRow): void;
  noShow(row: ShownRow): void;
  reverseNoShow(row: ShownRow): void;
}

function statusWords(row: ShownRow, state: RowState, timeZone: string): string {
  switch (state) {
    case 'waiting':
      return 'Waiting';
    case 'late':
      return `Late — window ended ${formatClock(row.window.endsAt, timeZone)}`;
    case 'may-no-show':
      return `Late — can be marked no-show (window ended ${formatClock(row.window.endsAt, timeZone)})`;
    case 'handed-over':
      return `Handed over${row.collectedAt ? ` ${formatClock(row.collectedAt, timeZone)}` : ''}${row.collectedBy ? ` by ${row.collectedBy}` : ''}`;
    case 'no-show':
      return `No-show${row.noShowAt ? ` (marked ${formatClock(row.noShowAt, timeZone)})` : ''}`;
    case 'refunded':
      return 'Refunded — don’t hand over';
    case 'cancelled':
      return 'Cancelled — don’t hand over';
    default:
      return 'Not paid — don’t hand over';
  }
}

const tone: Record<RowState, string> = {
  waiting: 'text-ink',
  late: 'text-honey-800',
  'may-no-show': 'text-honey-800',
  'handed-over': 'text-sage-700',
  'no-show': 'text-brick-700',
  refunded: 'text-brick-700',
  cancelled: 'text-brick-700',
  'not-paid': 'text-brick-700',
};

/** One order on the pickup list: who, which code, what is in the boxes, its state in words, and the one big action. */
export function PickupCard({ row, now, timeZone, actions }: { row: ShownRow; now: number; timeZone: string; actions: CardActions }) {
  const state = rowState(row, now);
  const undoLeft = undoSecondsLeft(row, now);
  const done = state === 'handed-over' || state === 'refunded' || state === 'cancelled';
  return (
    <article aria-label={row.name} className={`card flex flex-col gap-2 p-4 ${done ? 'opacity-80' : ''}`}>
      <div className="flex items-baseline justify-between gap-3">
        <h3 className="text-xl leading-tight">{row.name}</h3>
        {row.pickupCode && (
          <span className="font-mono text-lg font-bold tracking-[0.15em]" aria-label={`Pickup code ${row.pickupCode.split('').join(' ')}`}>
            {row.pickupCode}
          </span>
        )}
      </div>
      <ul className="text-[0.95rem] leading-snug">
        {row.boxes.map((box, i) => (
          <li key={i}>{boxText(box)}</li>
        ))}
      </ul>
      <p className={`flex items-center gap-2 font-bold ${tone[state]}`}>
        <StatusIcon name={state} />
        <span data-testid="pickup-status">{statusWords(row, state, timeZone)}</span>
      </p>
      {row.waiting && (
        <p className="flex items-center gap-2 text-sm font-semibold text-plum-700">
          <StatusIcon name="sending" className="h-4 w-4" /> Waiting to send
        </p>
      )}
      {(state === 'waiting' || state === 'late' || state === 'may-no-show' || state === 'no-show') && (
        <button type="button" className="btn btn-primary min-h-14 w-full text-lg" onClick={() => actions.handOver(row)}>
          Hand over
        </button>
      )}
      {undoLeft > 0 && (
        <button type="button" className="btn btn-quiet min-h-14 w-full text-lg" onClick={() => actions.undo(row)}>
          Undo hand-over ({undoLeft} s)
        </button>
      )}
      {state === 'may-no-show' && (
        <button type="button" className="btn btn-quiet min-h-12 w-full" onClick={() => actions.noShow(row)}>
          Mark as no-show
        </button>
      )}
      {state === 'no-show' && (
        <button type="button" className="btn btn-quiet min-h-12 w-full" onClick={() => actions.reverseNoShow(row)}>
          Undo no-show
        </button>
      )}
    </article>
  );
}
