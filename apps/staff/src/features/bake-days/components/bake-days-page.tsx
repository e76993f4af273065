import { PageFrame } from '../../../components/page-frame';
import { PlannedPanel } from '../../../components/planned-panel';
import { plannedPages } from '../../../config/planned-pages';
import { CapacityTable } from './capacity-table';

export function BakeDaysPage() {
  const plan = plannedPages['bake-days'];
  return (
    <PageFrame eyebrow="Owner" title="Bake days" intro={plan?.intro}>
      <CapacityTable />
      {plan && <PlannedPanel plan={plan} />}
    </PageFrame>
  );
}
