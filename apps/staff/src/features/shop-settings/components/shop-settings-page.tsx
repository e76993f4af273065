import { useQuery } from '@tanstack/react-query';
import { ErrorState, LoadingState } from '@fryline/ui';
import { PageFrame } from '../../../components/page-frame';
import { shopSettingsQueries } from '../api/shop-settings-queries';
import { LogoPanel } from './logo-panel';
import { OrderLimitPanel } from './order-limit-panel';
import { ShopSettingsForm } from './shop-settings-form';

/** `/staff/settings`: the shop's name and logo, time zone, money, holds, no-shows and refund policy. */
export function ShopSettingsPage() {
  const settings = useQuery(shopSettingsQueries.current());
  return (
    <PageFrame eyebrow="Owner" title="Shop settings" intro="What applies to the whole shop: its name and logo, time zone, money and tax, how long a box is held, how much one customer can order, and what customers read about refunds.">
      {settings.isPending ? (
        <LoadingState label="Loading the settings…" />
      ) : settings.isError ? (
        <ErrorState error={settings.error} title="The settings could not be loaded" onRetry={() => void settings.refetch()} />
      ) : (
        <>
          <ShopSettingsForm settings={settings.data} />
          <LogoPanel shopName={settings.data.shopName} />
          <OrderLimitPanel />
        </>
      )}
    </PageFrame>
  );
}
