import type { OrderStatus } from '@fryline/schemas';

export const orderStatusNames: Record<OrderStatus, string> = {
  held: 'Awaiting payment',
  paid: 'Paid',
  collected: 'Collected',
  no_show: 'No-show',
  cancelled: 'Cancelled',
  refunded: 'Refunded',
  expired: 'Hold lapsed',
};

const tones: Record<OrderStatus, string> = {
  held: 'badge-warn',
  paid: 'badge-ok',
  collected: 'badge-plum',
  no_show: 'badge-bad',
  cancelled: '',
  refunded: '',
  expired: '',
};

export function OrderStatusBadge({ status }: { status: OrderStatus }) {
  return <span className={`badge ${tones[status]}`}>{orderStatusNames[status]}</span>;
}
