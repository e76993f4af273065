import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { RefundRequest, RefundView, StaffOrderView } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';
import { queryRoots } from '../../../lib/query-keys';

export interface RefundVariables {
  orderId: string;
  body: RefundRequest;
  /** One key per refund dialog: a retry or a second click with it refunds once. */
  requestKey: string;
}

/** `POST /api/staff/orders/:id/refunds`, with the dialog's Idempotency-Key. */
function postRefund({ orderId, body, requestKey }: RefundVariables): Promise<RefundView> {
  return api.post<RefundView>(`/api/staff/orders/${encodeURIComponent(orderId)}/refunds`, body, { headers: { 'Idempotency-Key': requestKey } });
}

/** Refunds part or all of a paid order; the bake day's figures and order list are fetched afresh after. */
export function useRefundOrder() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: postRefund,
    onSuccess: (made) => {
      // Put the server's new figures into every cached order list at once, so a
      // dialog reopened before the refetch lands starts from the right amount.
      queryClient.setQueriesData<StaffOrderView[]>({ queryKey: queryRoots.bakeDays }, (orders) =>
        Array.isArray(orders) && orders.some((o) => o?.id === made.orderId && 'refundedCents' in o)
          ? orders.map((o) => (o.id === made.orderId ? { ...o, status: made.order.status, refundedCents: made.order.refundedCents } : o))
          : orders,
      );
      return queryClient.invalidateQueries({ queryKey: queryRoots.bakeDays });
    },
  });
}
