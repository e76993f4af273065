import { useParams } from 'react-router-dom';
import { RoleGuard } from '../session/role-guard';
import { EditBakeDayPage } from '../../features/bake-days/components/edit-bake-day-page';

/** `/staff/bake-days/:bakeDayId/edit`: change or call off a bake day (owner). */
export function EditBakeDayRoute() {
  const { bakeDayId = '' } = useParams();
  return (
    <RoleGuard minRole="owner">
      <EditBakeDayPage key={bakeDayId} bakeDayId={bakeDayId} />
    </RoleGuard>
  );
}
