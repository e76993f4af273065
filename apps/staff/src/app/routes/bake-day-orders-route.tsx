import { useParams } from 'react-router-dom';
import { RoleGuard } from '../session/role-guard';
import { useCan } from '../session/staff-member';
import { BakeDayOrdersPage } from '../../features/orders/components/bake-day-orders-page';

/** `/staff/bake-days/:bakeDayId`: one bake day's orders, in the owner's Bake days section. */
export function BakeDayOrdersRoute() {
  const { bakeDayId = '' } = useParams();
  const canRefund = useCan('owner');
  return (
    <RoleGuard minRole="owner">
      <BakeDayOrdersPage key={bakeDayId} bakeDayId={bakeDayId} canRefund={canRefund} />
    </RoleGuard>
  );
}
