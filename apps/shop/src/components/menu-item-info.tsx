import type { MenuItemView } from '@fryline/schemas';
import { useMoney } from '@fryline/ui';
import { AllergenList } from './allergen-list';

/** A menu item's name, flavour and glaze, extra charge and allergens. */
export function MenuItemInfo({ item, headingLevel = 'p' }: { item: MenuItemView; headingLevel?: 'p' | 'h3' | 'h4' }) {
  const money = useMoney();
  const Name = headingLevel;
  const detail = [item.flavour, item.glaze].filter((part) => part && part !== item.name).join(' · ');
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <Name className="text-base font-extrabold">{item.name}</Name>
      {detail && <p className="text-sm text-muted">{detail}</p>}
      {item.description && <p className="text-sm">{item.description}</p>}
      {item.surchargeCents > 0 && (
        <p className="text-sm font-semibold text-sugar-700">+{money(item.surchargeCents)} each</p>
      )}
      <AllergenList allergens={item.allergens} />
    </div>
  );
}
