import { z } from 'zod';
import {
  allergens as allergenNames,
  centsToInput,
  menuItemInputSchema,
  moneyTextSchema,
  type Allergen,
  type MenuItemAdminView,
  type MenuItemInput,
  type MenuItemPatch,
} from '@fryline/schemas';
import { imageProblem } from '../../../lib/upload-image';

/** The nine, in the order the form lists them: the three in every doughnut first. */
export const allergenChoices: readonly Allergen[] = ['wheat', 'milk', 'eggs', 'soybeans', 'tree nuts', 'peanuts', 'sesame', 'fish', 'crustacean shellfish'];
// the form's list and the shared list must be the same nine
if (allergenChoices.length !== allergenNames.length || !allergenNames.every((a) => allergenChoices.includes(a))) {
  throw new Error('allergenChoices is out of step with the allergen list in @fryline/schemas');
}

/** What the form holds: the extra charge as typed text, the glaze recipe as '' for none. */
export const menuFormSchema = menuItemInputSchema.extend({
  surchargeCents: moneyTextSchema.pipe(menuItemInputSchema.shape.surchargeCents),
  glazeRecipeId: z.string().transform((id) => (id === '' ? null : id)),
});
export type MenuFormValues = z.input<typeof menuFormSchema>;

export const blankMenuForm: MenuFormValues = {
  name: '',
  kind: 'ring',
  flavour: '',
  glaze: '',
  glazeRecipeId: '',
  allergens: ['wheat', 'milk', 'eggs'],
  description: '',
  surchargeCents: '0.00',
};

export function formFromItem(item: MenuItemAdminView): MenuFormValues {
  return {
    name: item.name,
    kind: item.kind,
    flavour: item.flavour,
    glaze: item.glaze,
    glazeRecipeId: item.glazeRecipeId ?? '',
    allergens: item.allergens.filter((a): a is Allergen => (allergenNames as readonly string[]).includes(a)),
    description: item.description ?? '',
    surchargeCents: centsToInput(item.surchargeCents),
  };
}

/** Only what changed, for an edit; an empty patch means nothing to save. */
export function patchFrom(item: MenuItemAdminView, input: MenuItemInput): MenuItemPatch {
  const before: Record<string, unknown> = { ...formFromItem(item), glazeRecipeId: item.glazeRecipeId ?? null, surchargeCents: item.surchargeCents };
  const patch: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(input)) {
    if (JSON.stringify(before[key]) !== JSON.stringify(value)) patch[key] = value;
  }
  return patch as MenuItemPatch;
}

/** Why a chosen photo can't be sent, or null (the server checks again, by content). */
export const photoProblem = (file: File) => imageProblem(file, 'photo');
