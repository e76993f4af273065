import { lazyPage } from '../../../lib/lazy-page';

/** The equipment settings (`/staff/equipment`). */
export const EquipmentPage = lazyPage(() => import('./equipment-settings-page'), 'Opening the equipment settings…');
