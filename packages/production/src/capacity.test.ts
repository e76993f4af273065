import { describe, expect, it } from 'vitest';
import { capacityFromEquipment, checkCapacityOverride } from './capacity.js';

const kit = {
  fryWindowMinutes: 120,
  piecesPerBatch: 3,
  minutesPerBatch: 3.5,
  proofingTrays: 6,
  piecesPerTray: 12,
  mixerCapacityGrams: 4000,
  mixes: 2,
  doughGramsPerPiece: 100,
  fridgeDoughGrams: 9000,
};

describe('capacity from equipment (worked by hand from the stated rule)', () => {
  it('is the smallest of fry, trays, mixer and fridge', () => {
    const c = capacityFromEquipment(kit);
    // fry: ⌊120 / 3.5⌋ = 34 batches × 3 = 102; trays 72; mixer 8000 / 100 = 80; fridge 90.
    expect(c.candidates).toEqual([
      { limit: 'fry', pieces: 102 },
      { limit: 'proofing-trays', pieces: 72 },
      { limit: 'mixer', pieces: 80 },
      { limit: 'fridge', pieces: 90 },
    ]);
    expect(c).toMatchObject({ pieces: 72, limitedBy: 'proofing-trays' });
  });

  it('names the fryer when frying is the bottleneck', () => {
    expect(capacityFromEquipment({ ...kit, fryWindowMinutes: 60 })).toMatchObject({ pieces: 51, limitedBy: 'fry' });
  });

  it('an owner may set a lower capacity; a higher one is kept with a warning', () => {
    const c = capacityFromEquipment(kit);
    expect(checkCapacityOverride(c, 60)).toEqual({ pieces: 60, derivedPieces: 72, warning: null });
    const high = checkCapacityOverride(c, 90);
    expect(high.pieces).toBe(90);
    expect(high.warning).toMatch(/above what the equipment allows \(72, limited by proofing-trays\)/);
    expect(() => checkCapacityOverride(c, -1)).toThrow(/overridePieces/);
  });
});
