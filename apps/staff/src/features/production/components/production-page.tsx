import { lazyPage } from '../../../lib/lazy-page';

/** The production sheet (`/staff/production`). */
export const ProductionPage = lazyPage(() => import('./production-sheet-page'), 'Opening the production sheet…');
