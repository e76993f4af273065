import { useId, useMemo, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { centsToInput, currencyName, currencySymbol, parseCents, type RefundRequest, type RefundView, type StaffOrderView } from '@fryline/schemas';
import { isApiError, putFieldErrors } from '@fryline/ui/api-client';
import { useRefundOrder } from '../api/use-refund-order';
import { refundableCents, refundFormDefaults, refundFormSchema, type RefundFormValues } from '../model/refund-form';
import { ModalDialog, useMoney } from '@fryline/ui';

interface RefundDialogProps {
  /** The order as it was when the dialog opened. */
  order: StaffOrderView;
  onClose: () => void;
  onRefunded: (made: RefundView) => void;
}

function FieldError({ id, message }: { id: string; message: string | undefined }) {
  return message ? (
    <p id={id} className="field-error">
      {message}
    </p>
  ) : null;
}

/** Refund all or part of what is left on a paid order, with a reason. */
export function RefundDialog({ order, onClose, onRefunded }: RefundDialogProps) {
  // the order's own currency: what it was paid in, and so what it is refunded in
  const money = useMoney(order.currency);
  const currency = order.currency;
  const left = refundableCents(order);
  // One key for everything sent from this dialog: a double click or a retry refunds once.
  const [requestKey] = useState(() => crypto.randomUUID());
  const sending = useRef(false);
  const refund = useRefundOrder();
  const schema = useMemo(() => refundFormSchema(left, currency), [left, currency]);
  const form = useForm<RefundFormValues, unknown, RefundRequest>({
    resolver: zodResolver(schema),
    defaultValues: refundFormDefaults(left),
  });
  const [problem, setProblem] = useState<string | null>(null);
  const { errors } = form.formState;
  const mode = form.watch('mode');
  const typed = parseCents(form.watch('amount'));
  const id = useId();
  const amountRef = useRef<HTMLInputElement | null>(null);
  const amountField = form.register('amount');

  const chooseMode = (next: RefundFormValues['mode']) => {
    form.setValue('mode', next);
    if (next === 'full') {
      form.setValue('amount', centsToInput(left));
      form.clearErrors('amount');
    } else {
      amountRef.current?.select();
    }
  };

  const submit = form.handleSubmit((body) => {
    if (sending.current) return;
    sending.current = true;
    setProblem(null);
    refund.mutate(
      { orderId: order.id, body, requestKey },
      {
        onSuccess: onRefunded,
        onError: (error) => {
          if (isApiError(error, 'idempotency_mismatch')) {
            setProblem(
              'An earlier try from this form already refunded a different amount. Cancel, then check the order before refunding again.',
            );
            return;
          }
          if (isApiError(error) && error.fieldErrors.amountCents) chooseMode('part');
          const leftOver = putFieldErrors(
            error,
            (name, fieldError) => form.setError(name === 'amountCents' ? 'amount' : name, fieldError),
            ['amountCents', 'reason'] as const,
          );
          if (leftOver.length > 0) setProblem(leftOver.join(' '));
        },
        onSettled: () => {
          sending.current = false;
        },
      },
    );
  });

  const busy = refund.isPending;
  const described = (field: 'amount' | 'reason') =>
    [`${id}-${field}-help`, errors[field] && `${id}-${field}-error`].filter(Boolean).join(' ');

  return (
    <ModalDialog
      title={`Refund ${order.customer.name}’s order`}
      busy={busy}
      onClose={onClose}
      description={
        <>
          <p>
            {order.pickupCode && <>Pickup code {order.pickupCode}. </>}
            Paid {money(order.totalCents)}
            {order.refundedCents > 0 && <>, already refunded {money(order.refundedCents)}</>}.{' '}
            <strong>{money(left)} is left to refund.</strong>
          </p>
          <p className="text-sm text-muted">
            The money goes back to the card it was paid with, and the customer gets an e-mail about it.
          </p>
        </>
      }
    >
      <form onSubmit={(event) => void submit(event)} noValidate className="mt-4 flex flex-col gap-4">
        <fieldset>
          <legend className="field-label">How much</legend>
          <div className="flex flex-wrap gap-x-5 gap-y-2">
            {(['full', 'part'] as const).map((value) => (
              <label key={value} className="flex min-h-11 cursor-pointer items-center gap-2 font-semibold">
                <input
                  type="radio"
                  className="size-5 accent-plum-800"
                  value={value}
                  checked={mode === value}
                  onChange={() => chooseMode(value)}
                  disabled={busy}
                />
                {value === 'full' ? 'Full refund' : 'Part'}
              </label>
            ))}
          </div>
        </fieldset>

        <div>
          <label htmlFor={`${id}-amount`} className="field-label">
            Amount in {currencyName(currency)}
          </label>
          <div className="relative max-w-48">
            <span aria-hidden="true" className="absolute inset-y-0 left-3 flex items-center font-semibold text-muted">
              {currencySymbol(currency)}
            </span>
            <input
              id={`${id}-amount`}
              type="text"
              inputMode="decimal"
              autoComplete="off"
              className={`field-input pl-7 tabular-nums ${mode === 'full' ? 'bg-crumb' : ''}`}
              readOnly={mode === 'full'}
              aria-invalid={errors.amount ? true : undefined}
              aria-describedby={described('amount')}
              {...amountField}
              ref={(element) => {
                amountField.ref(element);
                amountRef.current = element;
              }}
            />
          </div>
          <p id={`${id}-amount-help`} className="mt-1 text-sm text-muted">
            {mode === 'full'
              ? 'Everything that is left. Choose “Part” to refund less.'
              : `Up to ${money(left)}. The order keeps its status.`}
          </p>
          <FieldError id={`${id}-amount-error`} message={errors.amount?.message} />
        </div>

        {mode === 'full' && order.status === 'paid' && (
          <p className="notice text-sm">
            A full refund before pickup marks the order refunded and puts its doughnuts back on sale.
          </p>
        )}

        <div>
          <label htmlFor={`${id}-reason`} className="field-label">
            Reason
          </label>
          <textarea
            id={`${id}-reason`}
            rows={2}
            maxLength={200}
            className="field-input"
            aria-required="true"
            aria-invalid={errors.reason ? true : undefined}
            aria-describedby={described('reason')}
            {...form.register('reason')}
          />
          <p id={`${id}-reason-help`} className="mt-1 text-sm text-muted">
            Kept with the refund, for you to look back on.
          </p>
          <FieldError id={`${id}-reason-error`} message={errors.reason?.message} />
        </div>

        {problem && (
          <p role="alert" className="notice notice-bad">
            {problem}
          </p>
        )}

        <div className="flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">
          <button type="button" className="btn btn-quiet" onClick={onClose} disabled={busy}>
            Cancel
          </button>
          <button type="submit" className="btn btn-danger" disabled={busy}>
            {busy && <span className="spinner" aria-hidden="true" />}
            {busy ? 'Refunding…' : typed !== null && typed >= 1 && typed <= left ? `Refund ${money(typed)}` : 'Refund'}
          </button>
        </div>
      </form>
    </ModalDialog>
  );
}
