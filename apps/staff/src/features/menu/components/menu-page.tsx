import { useQuery } from '@tanstack/react-query';
import { Link, useLocation } from 'react-router-dom';
import type { MenuItemAdminView } from '@fryline/schemas';
import { PageFrame } from '../../../components/page-frame';
import { Caution, ErrorState, LoadingState } from '@fryline/ui';
import { menuQueries } from '../api/menu-queries';
import { MenuItemCard } from './menu-item-card';

function ItemList({ items, label }: { items: MenuItemAdminView[]; label: string }) {
  if (items.length === 0) return <p className="text-muted">Nothing here yet.</p>;
  return (
    <ul className="grid gap-3 md:grid-cols-2" aria-label={label}>
      {items.map((item) => (
        <li key={item.id}>
          <MenuItemCard item={item} />
        </li>
      ))}
    </ul>
  );
}

/** `/staff/menu`: everything customers can put in a box, and what has been taken off. */
export function MenuPage() {
  const menu = useQuery(menuQueries.all());
  const saved = (useLocation().state as { saved?: string } | null)?.saved;
  const active = menu.data?.filter((m) => m.active) ?? [];
  const archived = menu.data?.filter((m) => !m.active) ?? [];
  return (
    <PageFrame eyebrow="Owner" title="Menu" intro="What customers can put in a box: each ring and hole, its glaze, allergens, extra charge and photo.">
      {saved && (
        <p role="status" className="notice notice-ok">
          {saved}
        </p>
      )}
      <div className="-mt-2 flex flex-wrap items-center justify-between gap-3">
        <p className="text-muted">Box sizes and their prices are set for each bake day when you announce it.</p>
        <Link to="/menu/new" className="btn btn-primary">
          Add an item
        </Link>
      </div>
      {menu.isPending ? (
        <LoadingState label="Loading the menu…" />
      ) : menu.isError ? (
        <ErrorState error={menu.error} title="The menu could not be loaded" onRetry={() => void menu.refetch()} />
      ) : (
        <>
          <section aria-labelledby="rings-heading" className="flex flex-col gap-3">
            <h2 id="rings-heading" className="text-xl">Rings</h2>
            <ItemList items={active.filter((m) => m.kind === 'ring')} label="Rings" />
          </section>
          <section aria-labelledby="holes-heading" className="flex flex-col gap-3">
            <h2 id="holes-heading" className="text-xl">Holes</h2>
            <ItemList items={active.filter((m) => m.kind === 'hole')} label="Holes" />
          </section>
          {archived.length > 0 && (
            <details className="card">
              <summary className="cursor-pointer text-lg font-extrabold">Archived ({archived.length})</summary>
              <p className="mt-2 mb-3 text-muted">Not offered any more; kept so past orders still show what was in them.</p>
              <ItemList items={archived} label="Archived items" />
            </details>
          )}
        </>
      )}
      <Caution title="Allergens">
        <p>
          Customers see each item's allergens before they pay, so tick everything in the dough, the glaze and the
          toppings. Labelling rules for food made at home differ from place to place: check the rules where you sell.
        </p>
      </Caution>
    </PageFrame>
  );
}
