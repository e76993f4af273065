import type { PickupWindowView } from '@fryline/schemas';
import { formatClockRange, plural } from '@fryline/ui/format';

interface PickupWindowOptionsProps {
  legend: string;
  name: string;
  windows: PickupWindowView[];
  timeZone: string;
  value: string | null;
  onChange: (windowId: string) => void;
  /** A window to leave out (e.g. the one an order already has). */
  excludeId?: string;
}

function roomText(window: PickupWindowView): string {
  if (window.ordersLeft === 0) return 'Full';
  if (window.ordersLeft === null) return 'Room available';
  return `Room for ${plural(window.ordersLeft, 'more order')}`;
}

/** Pickup windows as a radio group; full windows show but cannot be chosen. */
export function PickupWindowOptions({ legend, name, windows, timeZone, value, onChange, excludeId }: PickupWindowOptionsProps) {
  const shown = windows.filter((w) => w.id !== excludeId);
  return (
    <fieldset>
      <legend className="mb-2 text-lg font-extrabold">{legend}</legend>
      {shown.length === 0 ? (
        <p className="text-muted">There are no other pickup windows on this bake day.</p>
      ) : (
        <div className="grid gap-2 sm:grid-cols-2">
          {shown.map((w) => {
            const full = w.ordersLeft === 0;
            return (
              <label
                key={w.id}
                className={`flex items-center gap-3 rounded-2xl border-2 bg-white p-3 has-[:checked]:border-plum-700 has-[:checked]:bg-plum-50 has-[:focus-visible]:outline-3 has-[:focus-visible]:outline-sugar-500 ${
                  full ? 'cursor-not-allowed border-line opacity-60' : 'cursor-pointer border-line'
                }`}
              >
                <input
                  type="radio"
                  name={name}
                  value={w.id}
                  checked={value === w.id}
                  disabled={full}
                  onChange={() => onChange(w.id)}
                  className="size-5 shrink-0 accent-plum-700 focus-visible:outline-none"
                />
                <span>
                  <span className="block font-extrabold">{formatClockRange(w.startsAt, w.endsAt, timeZone)}</span>
                  <span className={`block text-sm ${full ? 'font-extrabold text-brick-700' : 'text-muted'}`}>
                    {roomText(w)}
                  </span>
                </span>
              </label>
            );
          })}
        </div>
      )}
    </fieldset>
  );
}
