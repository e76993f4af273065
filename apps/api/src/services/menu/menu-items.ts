import type { MenuItemAdminView } from '@fryline/schemas';
import { MenuItem } from '../../db/models/index.js';

/** Every menu item, active or not, as the staff manage them. */
export async function listMenuItems(): Promise<MenuItemAdminView[]> {
  const items = await MenuItem.findAll({ order: [['sortOrder', 'ASC'], ['name', 'ASC']] });
  return items.map((m) => ({ id: m.id, name: m.name, flavour: m.flavour, glaze: m.glaze, kind: m.kind, surchargeCents: m.surchargeCents, allergens: m.allergens, active: m.active }));
}
