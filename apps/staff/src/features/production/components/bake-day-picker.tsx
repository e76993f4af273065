import type { BakeDayView } from '@fryline/schemas';
import { formatDate } from '@fryline/ui/format';

/** Chooses which bake day a page is about. */
export function BakeDayPicker({
  id,
  days,
  value,
  onChange,
}: {
  id: string;
  days: readonly BakeDayView[];
  value: string;
  onChange: (bakeDayId: string) => void;
}) {
  return (
    <div className="min-w-56 flex-1 sm:max-w-sm">
      <label htmlFor={id} className="field-label">
        Bake day
      </label>
      <select id={id} className="field-input" value={value} onChange={(event) => onChange(event.target.value)}>
        {days.map((day) => (
          <option key={day.id} value={day.id}>
            {formatDate(day.date, day.timeZone, 'short')} · {day.place}
            {day.status === 'done' ? ' (done)' : ''}
          </option>
        ))}
      </select>
    </div>
  );
}
