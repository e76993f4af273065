import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import type { BakeDayView } from '@fryline/schemas';
import { useJoinWaitlist, useLeaveWaitlist } from '../api/use-waitlist-actions';
import { waitlistQueries } from '../api/waitlist-queries';
import { errorMessage } from '@fryline/ui/api-client';
import { formatDateTime, formatPieces } from '@fryline/ui/format';
import { isApiError, putFieldErrors } from '@fryline/ui/api-client';
import { goToSignIn } from '../../../lib/sign-in';

const count = z
  .number({ error: 'Enter a number' })
  .int('Enter a whole number')
  .min(0, 'Enter 0 or more')
  .max(120, 'That is more than we can set aside for one person');

const waitlistSchema = z
  .object({ rings: count, holes: count })
  .refine((value) => value.rings + value.holes > 0, { message: 'Ask for at least one ring or hole.', path: ['rings'] });
type WaitlistValues = z.infer<typeof waitlistSchema>;

const fields = ['rings', 'holes'] as const;

/**
 * The waitlist on a bake day's page: the customer's own place when they are
 * on the list (with change and leave), otherwise the form to join.
 */
export function WaitlistForm({ day }: { day: BakeDayView }) {
  const mine = useQuery({ ...waitlistQueries.mine(), retry: false });
  const entry = mine.data?.find((e) => e.bakeDayId === day.id);
  const [editing, setEditing] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  const leave = useLeaveWaitlist();

  if (entry && !editing) {
    return (
      <section className="card flex flex-col gap-3" aria-labelledby="waitlist-heading">
        <h2 id="waitlist-heading" className="text-xl">
          {entry.status === 'offered' ? 'Doughnuts are set aside for you' : 'You’re on the waitlist'}
        </h2>
        <p role="status" className="text-lg font-extrabold">
          {entry.status === 'offered'
            ? `We have set aside ${formatPieces(entry.rings, entry.holes)} for you${entry.offerExpiresAt ? ` until ${formatDateTime(entry.offerExpiresAt, day.timeZone)}` : ''}: use the link in your e-mail.`
            : `You’re on the list (number ${entry.position ?? '–'}, for ${formatPieces(entry.rings, entry.holes)}).`}
        </p>
        {message && <p className="text-sage-700">{message}</p>}
        <p className="text-muted">If doughnuts free up, we e-mail the next person on the list an offer to claim them. Nothing is charged unless you claim and pay.</p>
        <div className="flex flex-wrap gap-2">
          {entry.status === 'waiting' && (
            <button type="button" className="btn btn-quiet btn-small" onClick={() => { setMessage(null); setEditing(true); }}>
              Change how many
            </button>
          )}
          <button
            type="button"
            className="btn btn-quiet btn-small"
            disabled={leave.isPending}
            onClick={() => leave.mutate(entry.id, { onSuccess: () => setMessage(null), onError: (error) => setMessage(errorMessage(error)) })}
          >
            Leave the waitlist
          </button>
        </div>
      </section>
    );
  }
  return (
    <JoinForm
      day={day}
      current={entry ? { rings: entry.rings, holes: entry.holes } : undefined}
      onDone={(changed) => {
        setEditing(false);
        setMessage(changed ? 'Updated. We have e-mailed you the change.' : 'We have e-mailed you a confirmation.');
      }}
    />
  );
}

interface JoinFormProps {
  day: BakeDayView;
  /** The place being changed, when the customer is already on the list. */
  current?: { rings: number; holes: number };
  onDone: (changed: boolean) => void;
}

function JoinForm({ day, current, onDone }: JoinFormProps) {
  const join = useJoinWaitlist(day.id);
  const [formProblem, setFormProblem] = useState<string | null>(null);
  const ringsOut = day.remaining.rings <= 0;
  const form = useForm<WaitlistValues>({
    resolver: zodResolver(waitlistSchema),
    defaultValues: current ?? { rings: ringsOut && day.capacity.rings > 0 ? 6 : 0, holes: ringsOut ? 0 : 12 },
  });
  const { errors } = form.formState;
  const sellsHoles = day.capacity.holes > 0;

  const submit = form.handleSubmit((values) => {
    setFormProblem(null);
    join.mutate(values, {
      onSuccess: () => onDone(Boolean(current)),
      onError: (error) => {
        if (isApiError(error) && error.status === 401) {
          goToSignIn();
          return;
        }
        setFormProblem(putFieldErrors(error, form.setError, fields)[0] ?? null);
      },
    });
  });

  return (
    <form onSubmit={submit} noValidate className="card flex flex-col gap-4" aria-labelledby="waitlist-heading">
      <div>
        <h2 id="waitlist-heading" className="text-xl">
          {current ? 'Change your waitlist place' : 'Join the waitlist'}
        </h2>
        <p className="text-muted">
          When an order is cancelled or a hold lapses, the freed doughnuts are offered to the waitlist by e-mail, in
          turn. Tell us roughly how many you would like.
        </p>
      </div>
      <div className="grid grid-cols-2 gap-3">
        {fields
          .filter((name) => name === 'rings' || sellsHoles)
          .map((name) => (
            <div key={name}>
              <label htmlFor={`waitlist-${name}`} className="field-label">
                {name === 'rings' ? 'Rings' : 'Holes'}
              </label>
              <input
                id={`waitlist-${name}`}
                type="number"
                inputMode="numeric"
                min={0}
                className="field-input"
                aria-invalid={errors[name] ? true : undefined}
                aria-describedby={errors[name] ? `waitlist-${name}-error` : undefined}
                {...form.register(name, { valueAsNumber: true })}
              />
              {errors[name] && (
                <p id={`waitlist-${name}-error`} className="field-error">
                  {errors[name]?.message}
                </p>
              )}
            </div>
          ))}
      </div>
      {formProblem && (
        <p role="alert" className="notice notice-bad">
          {formProblem}
        </p>
      )}
      <button type="submit" className="btn btn-primary self-start" disabled={join.isPending}>
        {join.isPending && <span className="spinner" aria-hidden="true" />}
        {current ? 'Save the change' : 'Join the waitlist'}
      </button>
    </form>
  );
}
