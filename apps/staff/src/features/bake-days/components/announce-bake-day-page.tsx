import { lazyPage } from '../../../lib/lazy-page';

/** The new-bake-day form (`/staff/bake-days/new`); its time-zone arithmetic loads with it. */
export const AnnounceBakeDayPage = lazyPage(() => import('./announce-bake-day-screen'), 'Opening the new bake day form…');
