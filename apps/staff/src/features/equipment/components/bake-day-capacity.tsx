import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import type { Capacity } from '@fryline/production';
import { capacityOverrideSchema, type BakeDayView } from '@fryline/schemas';
import { isApiError, putFieldErrors } from '@fryline/ui/api-client';
import { formatDate } from '@fryline/ui/format';
import { useSetCapacity } from '../api/use-set-capacity';

type CapacityValues = z.input<typeof capacityOverrideSchema>;
type CapacityBody = z.output<typeof capacityOverrideSchema>;

/** Each coming bake day's capacity, with the equipment's figure ready to use. */
export function BakeDayCapacityList({ days, derived }: { days: readonly BakeDayView[]; derived: Capacity }) {
  const coming = days.filter((day) => day.status !== 'done');
  return (
    <section aria-labelledby="day-capacity-heading" className="card flex flex-col gap-3">
      <h2 id="day-capacity-heading" className="text-xl">
        Bake day capacity
      </h2>
      <p className="text-muted">
        Customers can order up to a bake day’s capacity. Use the equipment’s figure, or set your own: lower is always
        fine; higher asks you to confirm.
      </p>
      {coming.length === 0 ? (
        <p className="text-muted">No bake days are coming up.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {coming.map((day) => (
            <li key={`${day.id}-${derived.pieces}`}>
              <DayCapacityForm day={day} derived={derived} />
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}

function DayCapacityForm({ day, derived }: { day: BakeDayView; derived: Capacity }) {
  const setCapacity = useSetCapacity(day.id);
  const [confirm, setConfirm] = useState<{ body: CapacityBody; message: string } | null>(null);
  const [message, setMessage] = useState<{ tone: 'ok' | 'bad'; text: string } | null>(null);
  const form = useForm<CapacityValues, unknown, CapacityBody>({
    resolver: zodResolver(capacityOverrideSchema),
    defaultValues: { rings: derived.pieces, holes: day.capacity.holes, acceptAboveEquipment: false },
  });
  const { errors } = form.formState;
  const label = formatDate(day.date, day.timeZone, 'short');
  const idBase = `capacity-${day.id}`;

  const send = (body: CapacityBody) => {
    setMessage(null);
    setCapacity.mutate(body, {
      onSuccess: (result) => {
        setConfirm(null);
        setMessage({ tone: 'ok', text: `${label} now takes orders for up to ${result.rings} rings and ${result.holes} holes.` });
      },
      onError: (error) => {
        if (isApiError(error, 'above_equipment')) {
          setConfirm({ body: { ...body, acceptAboveEquipment: true }, message: error.message });
          return;
        }
        setConfirm(null);
        const left = putFieldErrors(error, form.setError, ['rings', 'holes'] as const);
        if (left.length > 0) setMessage({ tone: 'bad', text: left.join(' ') });
      },
    });
  };

  return (
    <form
      onSubmit={form.handleSubmit((body) => send({ ...body, acceptAboveEquipment: false }))}
      noValidate
      className="rounded-2xl border border-line p-3 sm:p-4"
      aria-label={`Capacity for ${label}`}
    >
      <p className="font-extrabold">
        {label} <span className="font-semibold text-muted">· {day.place}</span>
      </p>
      <p className="text-sm text-muted">
        Now: {day.capacity.rings} rings ({day.remaining.rings} left), {day.capacity.holes} holes ({day.remaining.holes}{' '}
        left)
      </p>
      <div className="mt-2 flex flex-wrap items-end gap-3">
        {(['rings', 'holes'] as const).map((name) => (
          <div key={name} className="w-28">
            <label htmlFor={`${idBase}-${name}`} className="field-label">
              {name === 'rings' ? 'Rings' : 'Holes'}
            </label>
            <input
              id={`${idBase}-${name}`}
              type="number"
              inputMode="numeric"
              min={0}
              step={1}
              className="field-input"
              aria-invalid={errors[name] ? true : undefined}
              aria-describedby={errors[name] ? `${idBase}-${name}-error` : undefined}
              {...form.register(name, { valueAsNumber: true })}
            />
          </div>
        ))}
        <button type="submit" className="btn btn-primary btn-small" disabled={setCapacity.isPending}>
          {setCapacity.isPending && !confirm && <span className="spinner" aria-hidden="true" />}
          Use as this bake day’s capacity
        </button>
      </div>
      {(['rings', 'holes'] as const).map(
        (name) =>
          errors[name] && (
            <p key={name} id={`${idBase}-${name}-error`} className="field-error">
              {errors[name]?.message}
            </p>
          ),
      )}
      {confirm && (
        <div role="alert" className="notice notice-warn mt-3 flex flex-col gap-2">
          <p>{confirm.message}</p>
          <p className="text-sm">
            More than the equipment allows means a longer night, more batches in the oil and less room for mistakes.
          </p>
          <div className="flex flex-wrap gap-2">
            <button
              type="button"
              className="btn btn-primary btn-small"
              disabled={setCapacity.isPending}
              onClick={() => send(confirm.body)}
            >
              Set {confirm.body.rings} rings anyway
            </button>
            <button type="button" className="btn btn-quiet btn-small" onClick={() => setConfirm(null)}>
              Keep the old capacity
            </button>
          </div>
        </div>
      )}
      {message && (
        <p role={message.tone === 'ok' ? 'status' : 'alert'} className={`notice mt-3 ${message.tone === 'ok' ? 'notice-ok' : 'notice-bad'}`}>
          {message.text}
        </p>
      )}
    </form>
  );
}
