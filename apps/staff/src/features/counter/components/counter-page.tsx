import { lazyPage } from '../../../lib/lazy-page';

/** The counter on bake day (`/staff/pickups`). */
export const CounterPage = lazyPage(() => import('./counter-screen'), 'Opening the pickup list…');
