import { PageFrame } from '../../../components/page-frame';
import { PlannedPanel } from '../../../components/planned-panel';
import { plannedPages } from '../../../config/planned-pages';
import { CapacityTable } from './capacity-table';
import { PastBakeDays } from './past-bake-days';

export function BakeDaysPage() {
  const plan = plannedPages['bake-days'];
  return (
    <PageFrame eyebrow="Owner" title="Bake days" intro={plan?.intro}>
      <p className="-mt-2 text-muted">Open a bake day to see its orders, find one by name or pickup code, and refund.</p>
      <CapacityTable />
      <PastBakeDays />
      {plan && <PlannedPanel plan={plan} />}
    </PageFrame>
  );
}
