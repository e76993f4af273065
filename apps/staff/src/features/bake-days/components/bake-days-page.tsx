import { Link } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { plannedPages } from '../../../config/planned-pages';
import { AnnouncedNotice } from './announced-notice';
import { CapacityTable } from './capacity-table';
import { PastBakeDays } from './past-bake-days';
import { DraftBakeDays } from './draft-bake-days';

export function BakeDaysPage() {
  const plan = plannedPages['bake-days'];
  return (
    <PageFrame eyebrow="Owner" title="Bake days" intro={plan?.intro}>
      <AnnouncedNotice />
      <div className="-mt-2 flex flex-wrap items-center justify-between gap-3">
        <p className="text-muted">Open a bake day to see its orders, find one by name or pickup code, and refund.</p>
        <Link to="/bake-days/new" className="btn btn-primary">
          Announce a bake day
        </Link>
      </div>
      <CapacityTable />
      <DraftBakeDays />
      <PastBakeDays />
      {plan && (
        <section aria-labelledby="bake-days-later" className="card border-dashed">
          <h2 id="bake-days-later" className="text-lg">
            Not here yet
          </h2>
          <ul className="mt-2 list-disc space-y-1 pl-5">
            {plan.will.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        </section>
      )}
    </PageFrame>
  );
}
