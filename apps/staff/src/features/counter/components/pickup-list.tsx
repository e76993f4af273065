import { useState } from 'react';
import type { BakeDayView } from '@fryline/schemas';
import { formatClockRange, plural } from '@fryline/ui/format';
import { groupByWindow, matchesSearch, restForNoShow, type ShownRow } from '../model/pickups';
import { FoundOrder, isWholeCode, type Lookup } from './find-order';
import { PickupCard, type CardActions } from './pickup-card';
import { QrScan } from './qr-scan';
import { RestNoShowButton } from './rest-no-show';

const whenWords = { now: 'Now', next: 'Next', later: 'Later', over: 'Over' } as const;

/** The day's orders by pickup window, the current window first, with search, scanning and one-tap hand-over. */
export function PickupList({
  day, rows, now, actions, lookup, onLookup,
}: {
  day: BakeDayView;
  rows: ShownRow[];
  now: number;
  actions: CardActions;
  lookup: Lookup | null;
  onLookup: (lookup: Lookup | null) => void;
}) {
  const [query, setQuery] = useState('');
  const [scanning, setScanning] = useState(false);
  const shown = rows.filter((r) => matchesSearch(r, query));
  const groups = groupByWindow(day.pickupWindows, shown, now).filter((g) => query === '' || g.rows.length > 0);

  return (
    <div className="flex flex-col gap-4">
      <form
        role="search"
        className="flex flex-col gap-2"
        onSubmit={(e) => {
          e.preventDefault();
          if (shown.length === 1) onLookup({ kind: 'row', orderId: shown[0]!.orderId });
          else if (isWholeCode(query)) onLookup({ kind: 'code', code: query });
        }}
      >
        <label htmlFor="pickup-search" className="font-extrabold">
          Find an order
        </label>
        <div className="flex gap-2">
          <input
            id="pickup-search"
            type="search"
            className="field-input min-h-14 flex-1 text-lg"
            placeholder="Name or pickup code"
            autoComplete="off"
            autoCapitalize="characters"
            enterKeyHint="search"
            value={query}
            onChange={(e) => setQuery(e.target.value)}
          />
          <button type="button" className="btn btn-accent min-h-14" onClick={() => setScanning((s) => !s)} aria-pressed={scanning}>
            Scan QR
          </button>
        </div>
      </form>
      {scanning && (
        <QrScan
          onClose={() => setScanning(false)}
          onCode={(text) => {
            setScanning(false);
            onLookup({ kind: 'code', code: text });
          }}
        />
      )}
      {query !== '' && shown.length === 0 && (
        <div className="notice notice-warn flex flex-col gap-2">
          <p>Nobody on this day’s list matches “{query}”.</p>
          {isWholeCode(query) && (
            <button type="button" className="btn btn-quiet min-h-12 bg-white" onClick={() => onLookup({ kind: 'code', code: query })}>
              Look the code up on other days
            </button>
          )}
        </div>
      )}
      {groups.map((group) => (
        <section key={group.window.id} aria-labelledby={`window-${group.window.id}`} className="flex flex-col gap-3">
          <header className="sticky top-0 z-10 -mx-4 flex flex-wrap items-baseline justify-between gap-x-3 border-b border-line bg-paper/95 px-4 py-2 backdrop-blur">
            <h2 id={`window-${group.window.id}`} className="text-lg">
              {formatClockRange(group.window.startsAt, group.window.endsAt, day.timeZone)}{' '}
              <span className={`badge ${group.when === 'now' ? 'badge-plum' : ''}`}>{whenWords[group.when]}</span>
            </h2>
            <p className="text-sm font-semibold text-muted" data-testid="window-totals">
              {group.totals.toHandOver} to hand over · {group.totals.handedOver} handed over
              {group.totals.noShows > 0 ? ` · ${plural(group.totals.noShows, 'no-show')}` : ''}
            </p>
          </header>
          {group.rows.length === 0 ? (
            <p className="text-muted">No orders in this window.</p>
          ) : (
            group.rows.map((row) => <PickupCard key={row.orderId} row={row} now={now} timeZone={day.timeZone} actions={actions} />)
          )}
        </section>
      ))}
      <RestNoShowButton bakeDayId={day.id} rest={restForNoShow(rows, now)} />
      {lookup && <FoundOrder lookup={lookup} rows={rows} bakeDayId={day.id} timeZone={day.timeZone} now={now} actions={actions} onClose={() => onLookup(null)} />}
    </div>
  );
}
