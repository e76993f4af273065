import type { MenuItemAdminView } from '@fryline/schemas';
import { useMoney } from '@fryline/ui';
import type { NewBakeDayForm } from './pickup-windows-fieldset';

const kinds = [
  { kind: 'ring', legend: 'Rings' },
  { kind: 'hole', legend: 'Doughnut holes' },
] as const;

/** What is on sale that day: every active menu item as a checkbox, rings and holes apart. */
export function MenuFieldset({ form, items }: { form: NewBakeDayForm; items: readonly MenuItemAdminView[] }) {
  const money = useMoney();
  const active = items.filter((item) => item.active);
  const error = form.formState.errors.menuItemIds;
  const message = error?.root?.message ?? error?.message;

  return (
    <fieldset className="card flex flex-col gap-3" aria-describedby={message ? 'menu-error' : undefined}>
      <legend className="float-left w-full text-xl font-extrabold">Menu</legend>
      <p className="text-muted">Untick what you are not making that day. Allergens show to customers before they pay.</p>
      {active.length === 0 && <p className="notice notice-warn">There is nothing on the menu yet.</p>}
      <div className="grid gap-4 sm:grid-cols-2">
        {kinds.map(({ kind, legend }) => {
          const ofKind = active.filter((item) => item.kind === kind);
          if (ofKind.length === 0) return null;
          return (
            <fieldset key={kind}>
              <legend className="field-label">{legend}</legend>
              <ul className="flex flex-col gap-1">
                {ofKind.map((item) => (
                  <li key={item.id}>
                    <label className="flex min-h-11 cursor-pointer items-start gap-3 py-1">
                      <input
                        type="checkbox"
                        value={item.id}
                        className="mt-1 size-5 shrink-0 accent-plum-800"
                        {...form.register('menuItemIds')}
                      />
                      <span>
                        <span className="font-semibold">{item.name}</span>
                        {item.surchargeCents > 0 && (
                          <span className="text-muted"> · {money(item.surchargeCents)} extra</span>
                        )}
                        {item.allergens.length > 0 && (
                          <span className="block text-sm text-muted">Contains {item.allergens.join(', ')}</span>
                        )}
                      </span>
                    </label>
                  </li>
                ))}
              </ul>
            </fieldset>
          );
        })}
      </div>
      {message && (
        <p id="menu-error" role="alert" className="field-error">
          {message}
        </p>
      )}
    </fieldset>
  );
}
