import { useQuery } from '@tanstack/react-query';
import { MyOrdersList } from '../../features/orders/components/my-orders-list';
import { MyWaitlist } from '../../features/waitlist/components/my-waitlist';
import { bakeDayQueries } from '../../features/bake-days/api/bake-day-queries';
import { PageTitle } from '../../components/page-title';

export function MyOrdersRoute() {
  const days = useQuery(bakeDayQueries.list());
  return (
    <div className="flex flex-col gap-8">
      <PageTitle>My orders</PageTitle>
      <section className="flex flex-col gap-4" aria-labelledby="orders-heading">
        <h1 id="orders-heading" tabIndex={-1} className="text-3xl">
          My orders
        </h1>
        <MyOrdersList />
      </section>
      <MyWaitlist bakeDays={days.data} />
    </div>
  );
}
