import type { ReactNode } from 'react';
import { roleNames, type StaffSection } from '../../config/sections';
import { plannedPages } from '../../config/planned-pages';
import { PageFrame } from '../../components/page-frame';
import { PlannedPanel } from '../../components/planned-panel';
import { RoleGuard } from '../session/role-guard';
import { BakeDaysPage } from '../../features/bake-days/components/bake-days-page';
import { EquipmentPage } from '../../features/equipment/components/equipment-page';
import { FormulaPage } from '../../features/formula/components/formula-page';
import { ProductionPage } from '../../features/production/components/production-page';
import { StaffPage } from '../../features/staff-members/components/staff-page';
import { lazyPage } from '../../lib/lazy-page';

// The charting library loads only with this page.
const SalesPage = lazyPage(() => import('../../features/sales/components/sales-page'), 'Loading the sales page…');
import { MenuPage } from '../../features/menu/components/menu-page';
import { ShopSettingsPage } from '../../features/shop-settings/components/shop-settings-page';
import { AuditLogPage } from '../../features/audit-log/components/audit-log-page';
import { CounterPage } from '../../features/counter/components/counter-page';
import { PaymentChecksPage } from '../../features/payment-checks/components/payment-checks-page';

/** Sections that have a page of their own; the rest show what is planned. */
const builtPages: Record<string, ReactNode> = {
  pickups: <CounterPage />,
  'bake-days': <BakeDaysPage />,
  production: <ProductionPage />,
  formula: <FormulaPage />,
  equipment: <EquipmentPage />,
  staff: <StaffPage />,
  sales: <SalesPage />,
  menu: <MenuPage />,
  settings: <ShopSettingsPage />,
  'payment-checks': <PaymentChecksPage />,
  'audit-log': <AuditLogPage />,
};

/** Whether a section has a working page (the menu lists only those). */
export const isBuilt = (path: string): boolean => path in builtPages;

export function SectionRoute({ section }: { section: StaffSection }) {
  const plan = plannedPages[section.path];
  const page = builtPages[section.path] ?? (
    <PageFrame eyebrow={roleNames[section.minRole]} title={section.label} intro={plan?.intro}>
      {plan && <PlannedPanel plan={plan} />}
    </PageFrame>
  );
  return <RoleGuard minRole={section.minRole}>{page}</RoleGuard>;
}
