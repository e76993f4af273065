import { useQuery } from '@tanstack/react-query';
import { Link, useLocation, useParams } from 'react-router-dom';
import { ErrorState, LoadingState } from '@fryline/ui';
import { PageFrame } from '../../../components/page-frame';
import { settingsQueries } from '../../../lib/queries/settings-queries';
import { menuQueries } from '../api/menu-queries';
import { MenuItemForm } from './menu-item-form';

/** `/staff/menu/new` and `/staff/menu/:itemId`. */
export function MenuItemPage() {
  const { itemId } = useParams();
  const item = useQuery({ ...menuQueries.detail(itemId ?? ''), enabled: itemId !== undefined });
  const settings = useQuery(settingsQueries.current());
  const photoError = (useLocation().state as { photoError?: string } | null)?.photoError;
  const title = itemId ? (item.data ? `Edit ${item.data.name}` : 'Edit a menu item') : 'New menu item';
  const back = (
    <Link to="/menu" className="font-semibold">
      ← Back to the menu
    </Link>
  );
  let body;
  if ((itemId && item.isPending) || settings.isPending) body = <LoadingState label="Loading…" />;
  else if (itemId && item.isError) body = <ErrorState error={item.error} title="This item could not be loaded" onRetry={() => void item.refetch()} />;
  else if (settings.isError) body = <ErrorState error={settings.error} title="The glaze recipes could not be loaded" onRetry={() => void settings.refetch()} />;
  else body = <MenuItemForm key={item.data?.id ?? 'new'} item={item.data} glazes={settings.data.glazes} initialPhotoError={photoError} />;
  return (
    <PageFrame eyebrow="Owner · Menu" title={title}>
      {back}
      {body}
    </PageFrame>
  );
}
