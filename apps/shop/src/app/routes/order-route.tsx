import { useQuery } from '@tanstack/react-query';
import { useParams } from 'react-router-dom';
import type { OrderView } from '@fryline/schemas';
import { OrderDetail } from '../../features/orders/components/order-detail';
import { MoveOrder } from '../../features/orders/components/move-order';
import { bakeDayQueries } from '../../features/bake-days/api/bake-day-queries';

/** The move panel needs the bake day's windows and how much room each has left. */
function MoveWithWindows({ order }: { order: OrderView }) {
  const day = useQuery(bakeDayQueries.detail(order.bakeDay.id));
  if (day.isError) return null;
  return <MoveOrder order={order} windows={day.data?.pickupWindows} />;
}

export function OrderRoute() {
  const { id = '' } = useParams();
  return <OrderDetail key={id} id={id} renderMove={(order) => <MoveWithWindows order={order} />} />;
}
