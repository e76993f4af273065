import { describe, expect, it } from 'vitest';
import { DEFAULT_PLAN_SETTINGS } from '@fryline/production';
import { glazeRecipeSchema, productionSettingsSchema, type ProductionSettingsInput } from '@fryline/schemas';
import { glazeIdFrom, newGlaze, partShares, settingsMessages } from './glazes';
import { storedSettings } from './test-settings';

const schemaId = (id: string) => glazeRecipeSchema.shape.id.safeParse(id).success;

describe('a new glaze’s id, made from its name', () => {
  it('drops accents the way Unicode NFKD splits them off (Unicode Standard Annex #15: è = e + U+0300)', () => {
    expect('è'.normalize('NFKD')).toBe('e\u0300');
    expect(glazeIdFrom('Crème brûlée', [])).toBe('creme-brulee');
  });

  it('keeps lower-case letters and digits, one dash for any run of anything else (the settings schema’s id pattern)', () => {
    expect(glazeIdFrom('  Maple & Pecan!! ', [])).toBe('maple-pecan');
    expect(glazeIdFrom('Glaze no. 2', [])).toBe('glaze-no-2');
    for (const name of ['Maple & Pecan', 'Glaze no. 2', 'x', '', '☕', 'A'.repeat(80), 'a-'.repeat(30)]) {
      expect(schemaId(glazeIdFrom(name, [])), name).toBe(true);
    }
  });

  it('is never too short for the pattern (2 to 40 characters): a one-letter or empty name still gets an id', () => {
    expect(glazeIdFrom('X', [])).toBe('glaze-x');
    expect(glazeIdFrom('☕', [])).toBe('glaze');
    expect(glazeIdFrom('A'.repeat(80), [])).toHaveLength(40);
  });

  it('takes "-2", "-3"… when the id is in use, still within 40 characters', () => {
    expect(glazeIdFrom('Cinnamon sugar', ['cinnamon-sugar'])).toBe('cinnamon-sugar-2');
    expect(glazeIdFrom('Cinnamon sugar', ['cinnamon-sugar', 'cinnamon-sugar-2'])).toBe('cinnamon-sugar-3');
    const long = 'b'.repeat(40);
    const next = glazeIdFrom(long, [long]);
    expect(next).toBe(`${'b'.repeat(38)}-2`);
    expect(schemaId(next)).toBe(true);
  });

  it('makes a recipe the settings accept once its first part is named', () => {
    const glaze = newGlaze(' Toasted maple ', DEFAULT_PLAN_SETTINGS.glazes.map((g) => g.id));
    expect(glaze.id).toBe('toasted-maple');
    expect(glazeRecipeSchema.safeParse(glaze).success).toBe(false);
    expect(glazeRecipeSchema.safeParse({ ...glaze, parts: [{ name: 'Maple syrup', parts: 1 }] }).success).toBe(true);
  });
});

describe('each part’s share by weight', () => {
  it('is parts ÷ all parts: 80 : 18 : 2 is 80 %, 18 %, 2 % (ratio arithmetic, worked by hand)', () => {
    expect(partShares([{ parts: 80 }, { parts: 18 }, { parts: 2 }])).toEqual([80, 18, 2]);
    expect(partShares([{ parts: 4 }, { parts: 1 }])).toEqual([80, 20]);
  });

  it('leaves out what is blank while the parts are typed', () => {
    expect(partShares([{ parts: 3 }, { parts: Number.NaN }])).toEqual([100, 0]);
    expect(partShares([{ parts: Number.NaN }])).toEqual([0]);
  });
});

// The wording is our own; these check it lands on the right fields and nowhere else.
describe('the form’s words for the glaze checks', () => {
  const settings = (): ProductionSettingsInput => {
    const { updatedAt: _ignored, ...values } = storedSettings();
    return values;
  };
  const messages = (values: ProductionSettingsInput) =>
    Object.fromEntries(
      (productionSettingsSchema.safeParse(values, { error: settingsMessages }).error?.issues ?? []).map((issue) => [
        issue.path.join('.'),
        issue.message,
      ]),
    );

  it('name the empty glaze, the empty part and the glaze with no parts', () => {
    const values = settings();
    values.glazes[0]!.name = '  ';
    values.glazes[0]!.parts[1]!.name = '';
    values.glazes[1]!.parts = [];
    expect(messages(values)).toEqual({
      'glazes.0.name': 'Name the glaze',
      'glazes.0.parts.1.name': 'Name the part',
      'glazes.1.parts': 'A glaze needs at least one part',
    });
  });

  it('leave the schema’s own messages alone', () => {
    const values = settings();
    values.glazes[0]!.gramsPerRing = -1;
    values.glazes[0]!.parts[0]!.parts = 0;
    expect(messages(values)).toEqual({
      'glazes.0.gramsPerRing': "Grams per ring can't be negative",
      'glazes.0.parts.0.parts': 'Parts must be more than 0',
    });
  });
});
