import { useState } from 'react';
import { useServerReset } from './section-form';
import type { BakeDayEditView } from '@fryline/schemas';
import { plural } from '@fryline/ui/format';
import { SectionForm } from './section-form';

interface Row {
  key: string;
  id?: string;
  start: string;
  end: string;
  maxOrders: string;
  booked: number;
}

const toRows = (day: BakeDayEditView): Row[] =>
  day.windows.filter((w) => !w.removed).map((w) => ({ key: w.id, id: w.id, start: w.start, end: w.end, maxOrders: w.maxOrders === null ? '' : String(w.maxOrders), booked: w.booked }));

/** The day's pickup windows: move one, cap it, add one, take one off. */
export function WindowsForm({ day }: { day: BakeDayEditView }) {
  const [rows, setRows] = useState<Row[]>(() => toRows(day));
  useServerReset(day.windows, () => setRows(toRows(day)));
  const removed = day.windows.filter((w) => w.removed && w.booked > 0);
  const set = (key: string, patch: Partial<Row>) => setRows((all) => all.map((r) => (r.key === key ? { ...r, ...patch } : r)));

  const build = () => {
    if (rows.length === 0) return 'Keep at least one pickup window.';
    const windows = [];
    for (const [i, r] of rows.entries()) {
      const cap = r.maxOrders.trim();
      if (cap !== '' && !/^\d+$/.test(cap)) return `Window ${i + 1}: the cap is a whole number of orders, or blank for none.`;
      if (!r.start || !r.end || r.start >= r.end) return `Window ${i + 1}: it must end after it starts.`;
      windows.push({ ...(r.id ? { id: r.id } : {}), start: r.start, end: r.end, maxOrders: cap === '' ? null : Number(cap) });
    }
    return { windows };
  };

  return (
    <SectionForm
      bakeDayId={day.id}
      title="Pickup windows"
      intro={`Local times (${day.timeZone}). Customers whose window moves or goes are e-mailed and may pick another window or cancel for a full refund. A cap can't go below the orders already in the window.`}
      build={build}
    >
      <ol className="flex flex-col gap-2">
        {rows.map((r, i) => (
          <li key={r.key} className="rounded-2xl border border-line p-3">
            <fieldset className="grid grid-cols-2 items-end gap-3 sm:grid-cols-[1fr_1fr_1fr_auto]">
              <legend className="px-1 text-sm font-extrabold text-muted">
                Window {i + 1}
                {r.booked > 0 && <span className="font-semibold"> · {plural(r.booked, 'order')} in it</span>}
              </legend>
              <label className="field-label">
                Starts
                <input type="time" className="field-input" value={r.start} onChange={(e) => set(r.key, { start: e.target.value })} />
              </label>
              <label className="field-label">
                Ends
                <input type="time" className="field-input" value={r.end} onChange={(e) => set(r.key, { end: e.target.value })} />
              </label>
              <label className="field-label">
                Most orders <span className="font-semibold text-muted">· optional</span>
                <input inputMode="numeric" className="field-input" value={r.maxOrders} onChange={(e) => set(r.key, { maxOrders: e.target.value })} />
              </label>
              <button type="button" className="btn btn-quiet btn-small" onClick={() => setRows((all) => all.filter((x) => x.key !== r.key))} disabled={rows.length <= 1}>
                Take off<span className="sr-only"> window {i + 1}</span>
              </button>
            </fieldset>
            {r.booked > 0 && <p className="mt-1 text-sm text-muted">Taking it off keeps its orders; their customers are asked to choose another window.</p>}
          </li>
        ))}
      </ol>
      <div>
        <button
          type="button"
          className="btn btn-quiet btn-small"
          disabled={rows.length >= 12}
          onClick={() => {
            const last = rows[rows.length - 1];
            const start = last?.end ?? '09:00';
            const [h, m] = start.split(':').map(Number);
            const end = `${String(Math.min((h ?? 9) + 1, 23)).padStart(2, '0')}:${String(m ?? 0).padStart(2, '0')}`;
            setRows((all) => [...all, { key: crypto.randomUUID(), start, end, maxOrders: '', booked: 0 }]);
          }}
        >
          Add a window
        </button>
      </div>
      {removed.length > 0 && (
        <p className="text-sm text-muted">
          Taken off but still holding orders:{' '}
          {removed.map((w) => `${w.start}–${w.end} (${plural(w.booked, 'order')})`).join(', ')}. Those customers were asked to move.
        </p>
      )}
    </SectionForm>
  );
}
