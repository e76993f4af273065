import { lazyPage } from '../../../lib/lazy-page';

/** The formula editor (`/staff/formula`). */
export const FormulaPage = lazyPage(() => import('./formula-editor-page'), 'Opening the formula…');
