import { queryOptions } from '@tanstack/react-query';
import { shopRulesApi as contract, type PaymentFlagView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

export const paymentChecksQueries = {
  /** Payments that did not match their order (`GET /api/staff/payment-flags`), newest first. */
  flags: () => queryOptions({ queryKey: ['payment-flags'] as const, queryFn: () => api.get<PaymentFlagView[]>(contract.listPaymentFlags.path), refetchInterval: 60_000 }),
};
