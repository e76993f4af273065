import { useState } from 'react';
import type { BakeDayEditView } from '@fryline/schemas';
import { FieldShell } from '@fryline/ui';
import { formatInstant } from '@fryline/production';
import { instantIn } from '../../model/new-bake-day-form';
import { SectionForm, useServerReset } from './section-form';

/** An instant as the value of a datetime-local input in the day's zone ("2026-12-10T18:00"). */
const localValue = (iso: string, zone: string) => formatInstant(Date.parse(iso), zone).slice(0, 16);

/** When pre-orders open and when they close (the cut-off). */
export function TimesForm({ day }: { day: BakeDayEditView }) {
  const [openAt, setOpenAt] = useState(() => localValue(day.ordersOpenAt, day.timeZone));
  const [cutoff, setCutoff] = useState(() => localValue(day.cutoffAt, day.timeZone));
  useServerReset([day.ordersOpenAt, day.cutoffAt], () => {
    setOpenAt(localValue(day.ordersOpenAt, day.timeZone));
    setCutoff(localValue(day.cutoffAt, day.timeZone));
  });
  const build = () => {
    const ordersOpenAt = instantIn(openAt, day.timeZone);
    const cutoffAt = instantIn(cutoff, day.timeZone);
    if (!ordersOpenAt) return 'Give the date and time orders open.';
    if (!cutoffAt) return 'Give the date and time orders close.';
    return { ordersOpenAt, cutoffAt };
  };
  return (
    <SectionForm
      bakeDayId={day.id}
      title="Order times"
      intro={`In ${day.timeZone}. Orders must close before the first pickup; the production sheet says when the dough has to be started.`}
      build={build}
    >
      <div className="grid gap-3 sm:grid-cols-2">
        <FieldShell id="edit-open" label="Orders open">
          <input id="edit-open" type="datetime-local" className="field-input" value={openAt} onChange={(e) => setOpenAt(e.target.value)} />
        </FieldShell>
        <FieldShell id="edit-cutoff" label="Orders close (cut-off)">
          <input id="edit-cutoff" type="datetime-local" className="field-input" value={cutoff} onChange={(e) => setCutoff(e.target.value)} />
        </FieldShell>
      </div>
    </SectionForm>
  );
}
