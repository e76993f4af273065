import type { BakeDayView } from '@fryline/schemas';
import { MenuItemInfo } from '../../../components/menu-item-info';
import { MenuPhoto, useMoney } from '@fryline/ui';

/** The bake day's boxes and menu, to read (when orders are not open). */
export function MenuList({ day }: { day: BakeDayView }) {
  const money = useMoney();
  if (day.menu.length === 0) return null;
  return (
    <section aria-labelledby="menu-heading" className="flex flex-col gap-4">
      <h2 id="menu-heading" className="text-xl">
        On the menu
      </h2>
      {day.boxes.length > 0 && (
        <ul className="flex flex-wrap gap-2" aria-label="Boxes and prices">
          {day.boxes.map((box) => (
            <li key={box.size} className="badge badge-plum text-sm">
              {box.label} ({box.pieces}) · {money(box.priceCents)}
            </li>
          ))}
        </ul>
      )}
      <ul className="grid gap-3 sm:grid-cols-2">
        {day.menu.map((item) => (
          <li key={item.id} className="card">
            {item.photo && (
              <MenuPhoto photo={item.photo} alt={`${item.name}, photographed`} sizes="(min-width: 640px) 320px, 100vw" className="mb-3 aspect-[4/3] w-full rounded-xl" />
            )}
            <MenuItemInfo item={item} headingLevel="h3" />
            <p className="mt-1 text-xs font-semibold text-muted uppercase">{item.kind === 'hole' ? 'Holes' : 'Rings'}</p>
          </li>
        ))}
      </ul>
    </section>
  );
}
