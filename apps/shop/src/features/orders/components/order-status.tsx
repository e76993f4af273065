import type { OrderStatus } from '@fryline/schemas';

const statusBadge: Record<OrderStatus, { label: string; className: string }> = {
  held: { label: 'Waiting for payment', className: 'badge-warn' },
  paid: { label: 'Paid · ready for pickup', className: 'badge-ok' },
  collected: { label: 'Collected', className: 'badge-plum' },
  no_show: { label: 'Not collected', className: '' },
  cancelled: { label: 'Cancelled', className: '' },
  refunded: { label: 'Refunded', className: '' },
  expired: { label: 'Hold lapsed', className: '' },
};

export function OrderStatusBadge({ status }: { status: OrderStatus }) {
  const badge = statusBadge[status];
  return <span className={`badge ${badge.className}`}>{badge.label}</span>;
}
