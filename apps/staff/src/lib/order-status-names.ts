import type { OrderStatus } from '@fryline/schemas';

/** An order's status in the staff app's words (several pages show it). */
export const orderStatusNames: Record<OrderStatus, string> = {
  held: 'Awaiting payment',
  paid: 'Paid',
  collected: 'Collected',
  no_show: 'No-show',
  cancelled: 'Cancelled',
  refunded: 'Refunded',
  expired: 'Hold lapsed',
};
