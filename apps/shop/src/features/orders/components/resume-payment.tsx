import { useResumeCheckout } from '../api/use-order-actions';
import { useToast } from '../../../components/toast';
import { errorMessage } from '@fryline/ui/api-client';

/** Opens a fresh checkout page for an order still on hold. */
export function ResumePayment({ orderId, label = 'Continue to payment' }: { orderId: string; label?: string }) {
  const resume = useResumeCheckout();
  const toast = useToast();
  const busy = resume.isPending || resume.isSuccess;
  return (
    <button
      type="button"
      className="btn btn-primary"
      disabled={busy}
      onClick={() =>
        resume.mutate(orderId, {
          onSuccess: ({ checkoutUrl }) => window.location.assign(checkoutUrl),
          onError: (error) => toast(errorMessage(error), 'bad'),
        })
      }
    >
      {busy && <span className="spinner" aria-hidden="true" />}
      {label}
    </button>
  );
}
