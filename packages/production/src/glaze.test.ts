import { describe, expect, it } from 'vitest';
import { glazeAmounts, type GlazeRecipe } from './glaze.js';
import { ProductionInputError } from './errors.js';

const milkGlaze: GlazeRecipe = {
  id: 'milk-glaze',
  name: 'Milk glaze',
  gramsPerRing: 15,
  gramsPerHole: 4,
  parts: [{ name: 'Icing sugar', parts: 4 }, { name: 'Milk', parts: 1 }],
};

describe('glaze amounts', () => {
  it('pieces × grams per piece, split by the 4:1 sugar:liquid ratio (worked by hand)', () => {
    const [g] = glazeAmounts([milkGlaze], [{ glazeId: 'milk-glaze', rings: 10, holes: 10 }]);
    expect(g!.onPiecesGrams).toBe(190);
    expect(g!.parts).toEqual([{ name: 'Icing sugar', grams: 152 }, { name: 'Milk', grams: 38 }]);
  });

  it('adds the bowl allowance and merges repeated needs (worked by hand)', () => {
    const [g] = glazeAmounts([{ ...milkGlaze, extraPercent: 20 }], [
      { glazeId: 'milk-glaze', rings: 6, holes: 0 },
      { glazeId: 'milk-glaze', rings: 4, holes: 0 },
    ]);
    expect(g!.rings).toBe(10);
    expect(g!.grams).toBeCloseTo(180, 9);
  });

  it('leaves out glazes nobody ordered and refuses unknown ones', () => {
    expect(glazeAmounts([milkGlaze], [])).toEqual([]);
    expect(() => glazeAmounts([milkGlaze], [{ glazeId: 'nope', rings: 1, holes: 0 }])).toThrow(ProductionInputError);
  });
});
