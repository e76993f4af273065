import { AppShell, useShop } from '@fryline/ui';
import { SiteHeader } from './site-header';
import { SiteFooter } from './site-footer';

export function AppLayout() {
  const shop = useShop();
  return <AppShell appName={shop?.name ?? 'Our shop'} header={<SiteHeader />} footer={<SiteFooter />} />;
}
