import { z } from 'zod';
import { centsToInput, formatCents, parseCents, refundRequestSchema, type OrderStatus, type StaffOrderView } from '@fryline/schemas';

/** Statuses an order can only reach after its payment went through. */
const PAID_STATUSES: readonly OrderStatus[] = ['paid', 'collected', 'no_show', 'cancelled', 'refunded'];

/** What can still be refunded on an order: 0 when it was never paid or is refunded in full. */
export function refundableCents(order: Pick<StaffOrderView, 'status' | 'paidAt' | 'totalCents' | 'refundedCents'>): number {
  if (order.paidAt === null || !PAID_STATUSES.includes(order.status)) return 0;
  return Math.max(0, order.totalCents - order.refundedCents);
}

export type RefundMode = 'full' | 'part';

/** The refund dialog's fields as typed. */
export interface RefundFormValues {
  mode: RefundMode;
  /** Dollars, as typed. */
  amount: string;
  reason: string;
}

export function refundFormDefaults(leftCents: number): RefundFormValues {
  return { mode: 'full', amount: centsToInput(leftCents), reason: '' };
}

/**
 * The refund dialog's rules for an order with `leftCents` still refundable:
 * an amount (in the shop's currency) between one cent and what is left, and a reason. Its
 * output is the API's refund request.
 */
export function refundFormSchema(leftCents: number, currency?: string) {
  return z
    .object({
      mode: z.enum(['full', 'part']),
      amount: z.string().transform((text, ctx) => {
        const cents = parseCents(text, currency);
        const message =
          cents === null
            ? 'Write the amount as a number, like 4.50'
            : cents < 1
              ? `The amount must be at least ${formatCents(1, currency)}`
              : cents > leftCents
                ? `At most ${formatCents(leftCents, currency)} is left to refund`
                : null;
        if (message !== null || cents === null) {
          ctx.addIssue({ code: 'custom', message: message ?? '' });
          return z.NEVER;
        }
        return cents;
      }),
      reason: refundRequestSchema.shape.reason,
    })
    .transform(({ amount, reason }) => ({ amountCents: amount, reason }))
    .pipe(refundRequestSchema);
}
