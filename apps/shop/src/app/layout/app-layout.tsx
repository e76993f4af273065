import { AppShell } from '@fryline/ui';
import { SiteHeader } from './site-header';
import { SiteFooter } from './site-footer';
import { site } from '../../config/site';

export function AppLayout() {
  return <AppShell appName={site.name} header={<SiteHeader />} footer={<SiteFooter />} />;
}
