import { describe, expect, it } from 'vitest';
import type { MenuItemAdminView } from '@fryline/schemas';
import { allergenChoices, blankMenuForm, formFromItem, menuFormSchema, patchFrom, photoProblem } from './menu-form';

const item: MenuItemAdminView = {
  id: '00000000-0000-4000-8000-000000000001',
  name: 'Brown Butter Maple',
  flavour: 'Brown butter',
  glaze: 'Maple glaze',
  glazeRecipeId: 'maple-glaze',
  kind: 'ring',
  surchargeCents: 50,
  allergens: ['wheat', 'milk', 'eggs'],
  description: 'Nutty dough, maple glaze.',
  active: true,
  archivedAt: null,
  photo: null,
};

describe('the menu item form', () => {
  it('lists exactly the nine major food allergens (U.S. FDA)', () => {
    expect([...allergenChoices].sort()).toEqual(['crustacean shellfish', 'eggs', 'fish', 'milk', 'peanuts', 'sesame', 'soybeans', 'tree nuts', 'wheat']);
  });

  it('reads the typed extra charge into whole cents, and "no glaze" as null', () => {
    const parsed = menuFormSchema.parse({ ...blankMenuForm, name: 'Plain Ring', flavour: 'Plain', surchargeCents: '$1.25' });
    expect(parsed).toMatchObject({ surchargeCents: 125, glazeRecipeId: null });
  });

  it.each(['1.255', '-1', 'free', '60.00'])('refuses an extra charge typed as %j', (typed) => {
    expect(menuFormSchema.safeParse({ ...blankMenuForm, name: 'Plain Ring', flavour: 'Plain', surchargeCents: typed }).success).toBe(false);
  });

  it('sends only what changed in an edit', () => {
    const values = formFromItem(item);
    expect(values.surchargeCents).toBe('0.50');
    const unchanged = menuFormSchema.parse(values);
    expect(patchFrom(item, unchanged)).toEqual({});
    const changed = menuFormSchema.parse({ ...values, surchargeCents: '0.75', allergens: ['wheat', 'milk', 'eggs', 'tree nuts'] });
    expect(patchFrom(item, changed)).toEqual({ surchargeCents: 75, allergens: ['wheat', 'milk', 'eggs', 'tree nuts'] });
  });

  it('names a photo over 8 MB or of another type before sending it', () => {
    const big = new File([new Uint8Array(8 * 1024 * 1024 + 1)], 'big.jpg', { type: 'image/jpeg' });
    expect(photoProblem(big)).toMatch(/limit is 8 MB/);
    expect(photoProblem(new File(['x'], 'notes.gif', { type: 'image/gif' }))).toMatch(/JPEG, PNG or WebP/);
    expect(photoProblem(new File(['x'], 'ok.webp', { type: 'image/webp' }))).toBeNull();
  });
});
