import { useState, type ReactNode } from 'react';
import { shopQuery, useCurrency, useMoney } from '@fryline/ui';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { createOrderSchema, type BakeDayView } from '@fryline/schemas';
import { useCreateOrder } from '../api/use-create-order';
import { boxOf, boxTitle, previewBill, toBoxInputs, type Draft } from '../model/draft';
import { PriceLines } from '../../../components/price-lines';
import { clearDraft } from '../model/draft-storage';
import { detailString, isApiError, putFieldErrors } from '@fryline/ui/api-client';
import { formatClockRange, formatDate, listWords, plural } from '@fryline/ui/format';
import { goToSignIn, signInUrl, currentPath } from '../../../lib/sign-in';
import { AllergenCaution } from '../../../components/allergen-caution';
import { allergensOf } from '../../../components/allergen-list';
import { RefundPolicy } from '../../../components/refund-policy';

const consentSchema = z.object({
  allergensRead: z.boolean().refine((ticked) => ticked, 'Please tick the box to say you have read the allergens.'),
});
type Consent = z.infer<typeof consentSchema>;

const conflictMessages: Record<string, string> = {
  sold_out: 'Sorry, there are no longer enough doughnuts left for this order. What is left has been updated; please change your boxes.',
  closed: 'Pre-orders for this bake day have just closed.',
  window_full: 'That pickup window has just filled up. Please go back and choose another.',
};

interface OrderReviewProps {
  day: BakeDayView;
  draft: Draft;
  scope: string;
  claimToken?: string;
  signedIn: boolean | undefined;
  onBack: () => void;
  renderHoldExists?: (orderId: string, onResolved: () => void) => ReactNode;
}

/** The last step: everything in the order, its price and allergens, a required tick, then payment. */
export function OrderReview({ day, draft, scope, claimToken, signedIn, onBack, renderHoldExists }: OrderReviewProps) {
  const money = useMoney();
  const currency = useCurrency();
  const createOrder = useCreateOrder();
  const holdMinutes = useQuery(shopQuery()).data?.holdMinutes;
  const [messages, setMessages] = useState<string[]>([]);
  const [holdOrderId, setHoldOrderId] = useState<string | null>(null);
  const form = useForm<Consent>({ resolver: zodResolver(consentSchema), defaultValues: { allergensRead: false } });
  const consentError = form.formState.errors.allergensRead?.message;

  const bill = previewBill(day, draft, currency);
  const pickupWindow = day.pickupWindows.find((w) => w.id === draft.pickupWindowId);
  const menu = new Map(day.menu.map((item) => [item.id, item]));
  const chosenItems = draft.boxes.flatMap((box) => Object.keys(box.items).flatMap((id) => menu.get(id) ?? []));
  const allergens = allergensOf(chosenItems);

  const leaving = createOrder.isSuccess;
  const busy = createOrder.isPending || leaving;

  const pay = form.handleSubmit(() => {
    if (busy) return;
    setMessages([]);
    const parsed = createOrderSchema.safeParse({
      bakeDayId: day.id,
      pickupWindowId: draft.pickupWindowId,
      boxes: toBoxInputs(draft),
    });
    if (!parsed.success) {
      setMessages(parsed.error.issues.map((issue) => issue.message));
      return;
    }
    createOrder.mutate(claimToken ? { ...parsed.data, claimToken } : parsed.data, {
      onSuccess: (order) => {
        clearDraft(scope);
        window.location.assign(order.checkoutUrl);
      },
      onError: (error) => {
        if (isApiError(error) && error.status === 401) {
          goToSignIn();
          return;
        }
        const heldOrderId = isApiError(error, 'hold_exists') ? detailString(error, 'orderId') : undefined;
        if (heldOrderId && renderHoldExists) {
          setHoldOrderId(heldOrderId);
          return;
        }
        const known = isApiError(error) ? conflictMessages[error.code] : undefined;
        setMessages(known ? [known] : putFieldErrors(error, form.setError, ['allergensRead']));
      },
    });
  });

  return (
    <section aria-labelledby="review-heading" className="flex flex-col gap-5">
      <h2 id="review-heading" tabIndex={-1} className="text-2xl">
        Check your order
      </h2>

      <div className="card">
        <h3 className="text-lg">Pickup</h3>
        <p className="mt-1">
          <span className="font-extrabold">{formatDate(day.date, day.timeZone)}</span>
          {pickupWindow && <>, {formatClockRange(pickupWindow.startsAt, pickupWindow.endsAt, day.timeZone)}</>}
        </p>
        <p>
          {day.place} · <span className="text-muted">{day.address}</span>
        </p>
      </div>

      <div className="card">
        <h3 className="text-lg">Your boxes</h3>
        <ul className="mt-2 divide-y divide-line">
          {draft.boxes.map((box, index) => (
            <li key={box.key} className="py-3">
              <p className="font-extrabold">
                {boxTitle(day, draft, box)} <span className="font-semibold text-muted">({boxOf(day, box.size)?.pieces})</span>
              </p>
              <ul className="mt-1 text-sm">
                {Object.entries(box.items).map(([id, quantity]) => (
                  <li key={id}>
                    {quantity} × {menu.get(id)?.name ?? 'Unknown item'}
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ul>
        <h4 className="mt-2 border-t border-line pt-3 text-base font-extrabold">What you pay</h4>
        <PriceLines bill={bill} totalLabel="To pay" />
        {day.tax.rateBasisPoints > 0 && (
          <p className="mt-1 text-sm text-muted">
            {day.tax.mode === 'added' ? 'Sales tax' : 'Tax'} at {day.tax.rateBasisPoints / 100}%{day.tax.mode === 'added' ? ' is added to the prices.' : ' is included in the prices.'}
          </p>
        )}
      </div>

      <div className="card flex flex-col gap-3">
        <h3 className="text-lg">Allergens in this order</h3>
        <p className="text-lg font-extrabold text-sugar-700">Contains {listWords(allergens)}.</p>
        <AllergenCaution />
        <form onSubmit={pay} noValidate className="flex flex-col gap-4">
          <div>
            <label className="flex cursor-pointer items-start gap-3 rounded-2xl border-2 border-line bg-white p-3">
              <input
                type="checkbox"
                className="mt-1 size-5 shrink-0 accent-plum-700"
                aria-invalid={consentError ? true : undefined}
                aria-describedby={consentError ? 'consent-error' : undefined}
                {...form.register('allergensRead')}
              />
              <span className="font-semibold">I have read the allergens for everything in this order.</span>
            </label>
            {consentError && (
              <p id="consent-error" className="field-error" role="alert">
                {consentError}
              </p>
            )}
          </div>

          {messages.length > 0 && (
            <div role="alert" className="notice notice-bad">
              {messages.map((message) => (
                <p key={message}>{message}</p>
              ))}
            </div>
          )}

          {holdOrderId && renderHoldExists?.(holdOrderId, () => setHoldOrderId(null))}

          <RefundPolicy />

          <p className="text-sm text-muted">
            When you continue, your boxes are held for you for {holdMinutes ? plural(holdMinutes, 'minute') : 'a few minutes'} while you pay on the secure checkout page.
            If the payment does not go through in that time, the hold lapses and nothing is charged.
          </p>

          <div className="flex flex-col-reverse gap-3 sm:flex-row sm:justify-between">
            <button type="button" className="btn btn-quiet" onClick={onBack} disabled={busy}>
              Back to your boxes
            </button>
            {signedIn === false ? (
              <a className="btn btn-primary" href={signInUrl(currentPath())}>
                Sign in to pay
              </a>
            ) : (
              <button type="submit" className="btn btn-primary" aria-disabled={busy}>
                {busy && <span className="spinner" aria-hidden="true" />}
                {leaving ? 'Taking you to payment…' : `Pay ${money(bill.totalCents)}`}
              </button>
            )}
          </div>
        </form>
      </div>
    </section>
  );
}
