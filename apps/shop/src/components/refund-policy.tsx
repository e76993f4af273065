import { useQuery } from '@tanstack/react-query';
import { shopQuery } from '@fryline/ui';

/** The owner's refund policy, as customers read it before they pay. */
export function RefundPolicy() {
  const shop = useQuery(shopQuery());
  return (
    <section aria-labelledby="refund-policy-heading" className="rounded-2xl border-2 border-line bg-white p-3">
      <h4 id="refund-policy-heading" className="font-extrabold">
        Refunds and cancelling
      </h4>
      {shop.isPending ? (
        <p className="text-sm text-muted">Loading the refund policy…</p>
      ) : shop.isError ? (
        <p className="text-sm text-muted">The refund policy could not be loaded. You can cancel for a full refund until orders close.</p>
      ) : (
        <p className="text-sm whitespace-pre-line">{shop.data.refundPolicy}</p>
      )}
    </section>
  );
}
