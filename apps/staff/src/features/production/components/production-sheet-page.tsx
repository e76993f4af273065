import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { ErrorState, LoadingState } from '@fryline/ui';
import { bakeDayQueries, nextBakeDay } from '../../../lib/queries/bake-day-queries';
import { errorMessage } from '@fryline/ui/api-client';
import { formatClock, formatDate } from '@fryline/ui/format';
import { UnitSwitch } from '../../../lib/unit-switch';
import { useUnits } from '../../../lib/use-units';
import { unitsInText } from '../../../lib/units';
import { useCan } from '../../../app/session/staff-member';
import type { PlanResponse } from '@fryline/schemas';
import { productionQueries } from '../../../lib/queries/production-queries';
import { warningMessages } from '../model/sheet';
import { BakeDayPicker } from './bake-day-picker';
import { CostSection } from './cost-section';
import { CountsSection } from './counts-section';
import { CutsSection } from './cuts-section';
import { DoughSection } from './dough-section';
import { FormulaNotice } from './formula-notice';
import { FrySection } from './fry-section';
import { GlazeSection } from './glaze-section';
import { LineSection } from './line-section';
import { MixesSection } from './mixes-section';
import { RouxSection } from './roux-section';
import { ScheduleSection } from './schedule-section';
import { SheetCautions, SheetWarnings } from './sheet-notes';
import { StarterSection } from './starter-section';
import './production-sheet.css';

const INTRO = 'Worked out from the orders; it updates by itself as more come in.';

/** The night-before sheet for one bake day, on screen and on one printed page. */
export default function ProductionSheetPage() {
  const days = useQuery(bakeDayQueries.upcoming());
  const [params, setParams] = useSearchParams();
  const chosen = params.get('day') ?? (days.data ? nextBakeDay(days.data)?.id ?? days.data[0]?.id : undefined);
  const plan = useQuery({ ...productionQueries.plan(chosen ?? ''), enabled: chosen !== undefined });

  const meta = plan.data?.meta;
  const title = meta
    ? `Production sheet — ${formatDate(meta.bakeDay.date, meta.bakeDay.timeZone)}, ${meta.bakeDay.place}`
    : 'Production sheet';

  let body;
  if (days.isPending) body = <LoadingState label="Loading bake days…" />;
  else if (days.isError) {
    body = <ErrorState error={days.error} title="Bake days could not be loaded" onRetry={() => void days.refetch()} />;
  } else if (chosen === undefined) {
    body = (
      <div className="card">
        <p className="font-extrabold">No bake day is planned.</p>
        <p className="text-muted">When the owner sets one up, its production sheet shows here.</p>
      </div>
    );
  } else if (plan.data) {
    // A failed refresh keeps the last sheet on screen, with a note.
    body = <Sheet data={plan.data} staleError={plan.isRefetchError ? plan.error : null} />;
  } else if (plan.isError) {
    body = <ErrorState error={plan.error} title="The sheet could not be worked out" onRetry={() => void plan.refetch()} />;
  } else body = <LoadingState label="Working out the sheet…" />;

  return (
    <PageFrame eyebrow="Baker" title={title} intro={INTRO}>
      <div className="flex flex-wrap items-end gap-x-6 gap-y-3" data-print="hide">
        {days.data && days.data.length > 0 && chosen !== undefined && (
          <BakeDayPicker
            id="sheet-bake-day"
            days={days.data}
            value={chosen}
            onChange={(day) => setParams({ day }, { replace: true })}
          />
        )}
        <UnitSwitch />
        <button type="button" className="btn btn-quiet" onClick={() => window.print()} disabled={!plan.data}>
          Print
        </button>
      </div>
      {body}
    </PageFrame>
  );
}

function Sheet({ data, staleError }: { data: PlanResponse; staleError: unknown }) {
  const [units] = useUnits();
  const isOwner = useCan('owner');
  const { plan, meta } = data;
  const zone = meta.bakeDay.timeZone;
  const warnings = warningMessages(plan, meta).map((warning) => unitsInText(warning, units));

  return (
    <div className="production-sheet flex flex-col gap-4">
      <div className="flex flex-col gap-2">
        <p className="font-semibold">
          Counts {meta.ordersCounted} {meta.ordersCounted === 1 ? 'order' : 'orders'} ({meta.paidOrders} paid,{' '}
          {meta.heldOrders} on hold) · worked out at {formatClock(meta.computedAt, zone)}
        </p>
        <FormulaNotice meta={meta} />
        {staleError !== null && (
          <p role="status" className="notice notice-bad" data-print="hide">
            Could not update the sheet ({errorMessage(staleError)}). It shows the figures worked out at{' '}
            {formatClock(meta.computedAt, zone)}.
          </p>
        )}
        {meta.ordersCounted === 0 && (
          <p className="notice" data-print="hide">
            No orders yet. The quantities fill in as pre-orders come in; the schedule already holds.
          </p>
        )}
      </div>
      <div className="sheet-grid grid gap-4 lg:grid-cols-2">
        <SheetWarnings warnings={warnings} />
        {/* On screen the group melts into the grid; on paper its sections flow down two balanced columns. */}
        <div className="sheet-columns">
          <CountsSection plan={plan} meta={meta} />
          <DoughSection plan={plan} units={units} />
          {plan.roux && <RouxSection roux={plan.roux} units={units} />}
          {plan.starter && <StarterSection starter={plan.starter} timeZone={zone} units={units} />}
          <CutsSection cuts={plan.cuts} units={units} />
          <FrySection fry={plan.fry} units={units} />
          <GlazeSection glazes={plan.glaze} units={units} />
        </div>
        {/* Full width on paper: the fry timetable flows in columns, one line a batch. */}
        <LineSection plan={plan} timeZone={zone} units={units} />
        <MixesSection mixes={plan.mixes} variations={plan.variations} timeZone={zone} units={units} />
        {isOwner && <CostSection cost={plan.cost} />}
        <ScheduleSection timeline={plan.timeline} timeZone={zone} units={units} />
        <SheetCautions cautions={plan.cautions.map((caution) => unitsInText(caution, units))} />
      </div>
    </div>
  );
}
