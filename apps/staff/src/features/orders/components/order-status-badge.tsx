import type { OrderStatus } from '@fryline/schemas';
import { orderStatusNames } from '../../../lib/order-status-names';


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
