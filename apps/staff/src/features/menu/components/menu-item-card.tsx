import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { MenuItemAdminView } from '@fryline/schemas';
import { ConfirmDialog, MenuPhoto, useMoney } from '@fryline/ui';
import { errorMessage } from '@fryline/ui/api-client';
import { useArchiveMenuItem } from '../api/use-menu-mutations';

/** One item on the owner's menu page: photo, what it is, its allergens, and what can be done with it. */
export function MenuItemCard({ item }: { item: MenuItemAdminView }) {
  const money = useMoney();
  const archive = useArchiveMenuItem();
  const [asking, setAsking] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const detail = [item.flavour, item.glaze].filter(Boolean).join(' · ');
  const setArchived = (archived: boolean) => {
    setProblem(null);
    archive.mutate(
      { id: item.id, archived },
      { onSuccess: () => setAsking(false), onError: (error) => { setAsking(false); setProblem(errorMessage(error)); } },
    );
  };
  return (
    <article aria-label={item.name} className={`card flex gap-3 p-3 sm:p-4 ${item.active ? '' : 'opacity-80'}`}>
      <div className="w-24 shrink-0">
        {item.photo ? (
          <MenuPhoto photo={item.photo} alt={`Photo of ${item.name}`} sizes="96px" className="aspect-square w-24 rounded-xl" />
        ) : (
          <div className="flex aspect-square w-24 items-center justify-center rounded-xl border-2 border-dashed border-line text-center text-xs text-muted">
            No photo
          </div>
        )}
      </div>
      <div className="flex min-w-0 flex-1 flex-col gap-1">
        <h3 className="text-lg leading-tight">{item.name}</h3>
        {detail && <p className="text-sm text-muted">{detail}</p>}
        <p className="text-sm">
          {item.surchargeCents > 0 ? <span className="font-semibold text-sugar-700">+{money(item.surchargeCents)} each</span> : 'No extra charge'}
        </p>
        <p className="text-sm">
          <span className="font-extrabold">Allergens:</span> {item.allergens.length > 0 ? item.allergens.join(', ') : <span className="text-brick-700">none ticked</span>}
        </p>
        {!item.active && (
          <p className="text-sm text-muted">
            Archived{item.orderCount ? ` · kept for ${item.orderCount} past order${item.orderCount === 1 ? '' : 's'}` : ''}
          </p>
        )}
        <div className="mt-1 flex flex-wrap gap-2">
          {item.active ? (
            <>
              <Link to={`/menu/${item.id}`} className="btn btn-quiet btn-small">
                Edit<span className="sr-only"> {item.name}</span>
              </Link>
              <button type="button" className="btn btn-quiet btn-small" onClick={() => setAsking(true)}>
                Archive<span className="sr-only"> {item.name}</span>
              </button>
            </>
          ) : (
            <button type="button" className="btn btn-quiet btn-small" disabled={archive.isPending} onClick={() => setArchived(false)}>
              Put back on the menu<span className="sr-only"> {item.name}</span>
            </button>
          )}
        </div>
        {problem && (
          <p role="alert" className="notice notice-bad text-sm">
            {problem}
          </p>
        )}
      </div>
      <ConfirmDialog
        open={asking}
        title={`Archive ${item.name}?`}
        confirmLabel="Archive"
        cancelLabel="Keep it on the menu"
        busy={archive.isPending}
        onConfirm={() => setArchived(true)}
        onClose={() => setAsking(false)}
      >
        <p>
          It leaves the menu: customers can no longer choose it, on any bake day. Orders that already have it keep it,
          and you can put it back later.
        </p>
      </ConfirmDialog>
    </article>
  );
}
