import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { useQuery } from '@tanstack/react-query';
import { orderLimitSchema, type OrderLimit } from '@fryline/schemas';
import { ErrorState, FieldShell, fieldAria, LoadingState } from '@fryline/ui';
import { putFieldErrors } from '@fryline/ui/api-client';
import { orderLimitQuery, useSaveOrderLimit } from '../api/order-limit-queries';

// The box holds text; the contract's rule reads the number out of it.
const formSchema = z.object({ maxPiecesPerCustomer: z.coerce.number({ message: 'A whole number of pieces' }) }).pipe(orderLimitSchema);
type FormValues = z.input<typeof formSchema>;

/**
 * Fair shares: the most pieces (rings and holes together) one customer can
 * have on one bake day, over all their orders; a waitlist request can't ask
 * for more either.
 */
export function OrderLimitPanel() {
  const limit = useQuery(orderLimitQuery());
  return (
    <section className="card flex flex-col gap-3" aria-labelledby="limit-heading">
      <h2 id="limit-heading" className="text-xl">
        Fair shares
      </h2>
      <p className="text-muted">
        So that one person can't take a whole bake day: the most pieces one customer can order for one day, rings and holes together,
        over all their orders. Orders already paid keep what they have.
      </p>
      {limit.isPending ? (
        <LoadingState label="Loading the limit…" />
      ) : limit.isError ? (
        <ErrorState error={limit.error} title="The limit could not be loaded" onRetry={() => void limit.refetch()} />
      ) : (
        <OrderLimitForm current={limit.data} />
      )}
    </section>
  );
}

function OrderLimitForm({ current }: { current: OrderLimit }) {
  const save = useSaveOrderLimit();
  const form = useForm<FormValues, unknown, OrderLimit>({ resolver: zodResolver(formSchema), defaultValues: { maxPiecesPerCustomer: String(current.maxPiecesPerCustomer) } });
  const error = form.formState.errors.maxPiecesPerCustomer?.message;
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);

  const submit = form.handleSubmit((body) => {
    setMessage(null);
    save.mutate(body, {
      onSuccess: (saved) => setMessage({ ok: true, text: `Saved: up to ${saved.maxPiecesPerCustomer} pieces a customer for each bake day.` }),
      onError: (err) => {
        const left = putFieldErrors(err, form.setError, ['maxPiecesPerCustomer'] as const);
        setMessage({ ok: false, text: left.length > 0 ? left.join(' ') : 'Not saved: see the message beside the field.' });
      },
    });
  });

  return (
    <form onSubmit={(event) => void submit(event)} noValidate className="flex flex-col gap-3 sm:flex-row sm:items-end" aria-label="Fair shares">
      <FieldShell id="limit-pieces" label="Pieces per customer per bake day" help="A dozen is 12 rings; a bag of holes counts its holes." error={error}>
        <input id="limit-pieces" className="field-input max-w-40" inputMode="numeric" {...fieldAria('limit-pieces', true, error)} {...form.register('maxPiecesPerCustomer')} />
      </FieldShell>
      <button type="submit" className="btn btn-primary" disabled={save.isPending}>
        {save.isPending ? 'Saving…' : 'Save the limit'}
      </button>
      {message && (
        <p role={message.ok ? 'status' : 'alert'} className={`notice ${message.ok ? 'notice-ok' : 'notice-bad'}`}>
          {message.text}
        </p>
      )}
    </form>
  );
}
