import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import type { BakeDayView } from '@fryline/schemas';
import { useJoinWaitlist } from '../api/use-waitlist-actions';
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

/** Join the waitlist for a sold-out bake day. */
export function WaitlistForm({ day }: { day: BakeDayView }) {
  const join = useJoinWaitlist(day.id);
  const [formProblem, setFormProblem] = useState<string | null>(null);
  const form = useForm<WaitlistValues>({
    resolver: zodResolver(waitlistSchema),
    defaultValues: { rings: day.capacity.rings > 0 ? 6 : 0, holes: 0 },
  });
  const { errors } = form.formState;
  const sellsHoles = day.capacity.holes > 0;

  const submit = form.handleSubmit((values) => {
    setFormProblem(null);
    join.mutate(values, {
      onError: (error) => {
        if (isApiError(error) && error.status === 401) {
          goToSignIn();
          return;
        }
        setFormProblem(putFieldErrors(error, form.setError, fields)[0] ?? null);
      },
    });
  });

  if (join.isSuccess) {
    return (
      <div role="status" className="notice notice-ok">
        <p className="font-extrabold">You are number {join.data.position} on the waitlist.</p>
        <p>If boxes free up, we e-mail you an offer. It is first come, first served, so act on it soon.</p>
      </div>
    );
  }

  return (
    <form onSubmit={submit} noValidate className="card flex flex-col gap-4" aria-labelledby="waitlist-heading">
      <div>
        <h2 id="waitlist-heading" className="text-xl">
          Join the waitlist
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
        Join the waitlist
      </button>
    </form>
  );
}
