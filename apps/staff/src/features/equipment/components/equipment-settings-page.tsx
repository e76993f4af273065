import { useQuery } from '@tanstack/react-query';
import { PageFrame } from '../../../components/page-frame';
import { ErrorState, LoadingState } from '@fryline/ui';
import { bakeDayQueries } from '../../../lib/queries/bake-day-queries';
import { settingsQueries } from '../../../lib/queries/settings-queries';
import { BakeDayCapacityList } from './bake-day-capacity';
import { CapacityPanel } from './capacity-panel';
import { SettingsForm } from './settings-form';

const INTRO =
  "What the kitchen can handle, the glazes it makes and what the ingredients cost. It sets each bake day's capacity and every figure on the production sheet.";

export default function EquipmentSettingsPage() {
  const settings = useQuery(settingsQueries.current());
  const capacity = useQuery(settingsQueries.capacity());
  const days = useQuery(bakeDayQueries.upcoming());

  return (
    <PageFrame eyebrow="Owner" title="Equipment" intro={INTRO}>
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <div className="flex flex-col gap-4">
          {settings.isPending ? (
            <LoadingState label="Loading the settings…" />
          ) : settings.isError ? (
            <ErrorState error={settings.error} title="The settings could not be loaded" onRetry={() => void settings.refetch()} />
          ) : (
            <SettingsForm settings={settings.data} capacity={capacity.isFetching ? undefined : capacity.data} />
          )}
        </div>
        <div className="flex flex-col gap-4">
          {capacity.isPending ? (
            <LoadingState label="Working out the capacity…" />
          ) : capacity.isError ? (
            <ErrorState error={capacity.error} title="The capacity could not be worked out" onRetry={() => void capacity.refetch()} />
          ) : (
            <>
              <CapacityPanel capacity={capacity.data} />
              {days.isError ? (
                <ErrorState error={days.error} title="Bake days could not be loaded" onRetry={() => void days.refetch()} />
              ) : days.data ? (
                <BakeDayCapacityList days={days.data} derived={capacity.data} />
              ) : (
                <LoadingState label="Loading bake days…" />
              )}
            </>
          )}
        </div>
      </div>
    </PageFrame>
  );
}
