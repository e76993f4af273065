import { AppShell } from '@fryline/ui';
import { StaffHeader } from './staff-header';

export function StaffLayout() {
  return <AppShell appName="Fryline staff" header={<StaffHeader />} width="wide" />;
}
