import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { PageFrame } from '../../../components/page-frame';
import { ErrorState, LoadingState } from '@fryline/ui';
import { bakeDayQueries } from '../../../lib/queries/bake-day-queries';
import { settingsQueries } from '../../../lib/queries/settings-queries';
import { menuItemQueries } from '../api/menu-item-queries';
import { latestBakeDay, newBakeDayDefaults } from '../model/new-bake-day-form';
import { browserZone } from '../model/time-zones';
import { AnnounceForm } from './announce-form';

/** A date picker's "YYYY-MM-DD" for today here. */
function localToday(): string {
  const now = new Date();
  return `${now.getFullYear()}-${String(now.getMonth() + 1).padStart(2, '0')}-${String(now.getDate()).padStart(2, '0')}`;
}

/** `/staff/bake-days/new`: the form, once what it starts from has loaded. */
export default function AnnounceBakeDayScreen() {
  const upcoming = useQuery(bakeDayQueries.upcoming());
  const past = useQuery(bakeDayQueries.past());
  const menu = useQuery(menuItemQueries.all());
  const capacity = useQuery(settingsQueries.capacity());
  // Past days and capacity only fill in starting values: the form opens without them if they fail.
  const waiting = upcoming.isPending || menu.isPending || past.isPending || capacity.isPending;

  return (
    <PageFrame
      eyebrow="Owner"
      title="Announce a bake day"
      intro="Date, place, pickup windows, that day’s menu and prices, and how many doughnuts to take orders for."
    >
      <p>
        <Link to="/bake-days" className="font-extrabold text-plum-800">
          <span aria-hidden="true">← </span>All bake days
        </Link>
      </p>
      {upcoming.isError ? (
        <ErrorState error={upcoming.error} title="Bake days could not be loaded" onRetry={() => void upcoming.refetch()} />
      ) : menu.isError ? (
        <ErrorState error={menu.error} title="The menu could not be loaded" onRetry={() => void menu.refetch()} />
      ) : waiting ? (
        <LoadingState label="Loading the menu and the last bake day…" />
      ) : (
        <AnnounceForm
          defaults={newBakeDayDefaults({
            latest: latestBakeDay(upcoming.data, past.data),
            equipmentRings: capacity.data?.pieces,
            menuItems: menu.data ?? [],
            fallbackZone: browserZone(),
          })}
          menuItems={menu.data ?? []}
          equipmentRings={capacity.data?.pieces}
          today={localToday()}
        />
      )}
    </PageFrame>
  );
}
