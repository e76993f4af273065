import { Link } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { AnnouncedNotice } from './announced-notice';
import { CapacityTable } from './capacity-table';
import { PastBakeDays } from './past-bake-days';
import { DraftBakeDays } from './draft-bake-days';

export function BakeDaysPage() {
  return (
    <PageFrame eyebrow="Owner" title="Bake days" intro="Dates, places, pickup windows and capacity.">
      <AnnouncedNotice />
      <div className="-mt-2 flex flex-wrap items-center justify-between gap-3">
        <p className="text-muted">Open a bake day to see its orders, find one by name or pickup code, refund, or change or call off the day.</p>
        <Link to="/bake-days/new" className="btn btn-primary">
          Announce a bake day
        </Link>
      </div>
      <CapacityTable />
      <DraftBakeDays />
      <PastBakeDays />
    </PageFrame>
  );
}
