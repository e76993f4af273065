import { describe, expect, it } from 'vitest';
import { DEFAULT_EQUIPMENT } from './defaults.js';
import {
  fryBatchSize, oilDensity, oilMassGrams, oilTempAfterLoad, oilVolumeLitres, piecesInPot, planFry,
} from './fry.js';
import { pieceMass } from './pieces.js';
import { fToC, inToMm, ozToG } from './units.js';

describe('oil in the pot', () => {
  it('volume of a 26 cm pot with 2 in of oil is π/4 · 260² · 50.8 mm³ (cylinder volume, πr²h)', () => {
    expect(oilVolumeLitres({ potDiameterMm: 260, depthMm: inToMm(2) })).toBeCloseTo(2.697, 3);
  });

  it('density 0.91–0.93 g/cm³ near room temperature, falling about 0.00064 g/cm³ per °C (JAOCS 76:1415–1419, 1999)', () => {
    expect(oilDensity(20)).toBeGreaterThanOrEqual(0.91);
    expect(oilDensity(20)).toBeLessThanOrEqual(0.93);
    expect(oilDensity(20) - oilDensity(120)).toBeCloseTo(0.064, 10);
    // canola oil, 1 cup = 218 g → 0.921 g/mL (USDA SR Legacy, NDB 04582)
    expect(oilDensity(20)).toBeCloseTo(0.921, 2);
    expect(oilMassGrams({ potDiameterMm: 100, depthMm: 127.32395447351627 })).toBeCloseTo(1000 * oilDensity(20), 6); // 1 L
  });
});

describe('pieces on the oil surface', () => {
  // Smallest pot radius R, in piece radii r, that holds n equal circles, n = 2..7 (from memory: optimal circle packings in a circle).
  const thresholds: Array<[number, number]> = [[2, 2], [3, 2.1547], [4, 2.4142], [5, 2.7013], [6, 3], [7, 3]];
  it.each(thresholds)('%s pieces need R/r ≥ %s (from memory)', (n, ratio) => {
    expect(piecesInPot({ potDiameterMm: 2 * (ratio + 0.002), footprintMm: 2 })).toBeGreaterThanOrEqual(n);
    expect(piecesInPot({ potDiameterMm: 2 * (ratio - 0.002), footprintMm: 2 })).toBeLessThan(n);
  });
});

describe('fry batch size', () => {
  const threeInchRing = pieceMass({
    outerMm: inToMm(3),
    innerMm: DEFAULT_EQUIPMENT.cutter.innerMm,
    thicknessMm: DEFAULT_EQUIPMENT.rolling.thicknessMm,
    densityGPerCm3: DEFAULT_EQUIPMENT.rolling.doughDensityGPerCm3,
  });
  const check = {
    potDiameterMm: 260,
    oilDepthMm: inToMm(2),
    oilStartC: fToC(375),
    oilFloorC: fToC(350),
    pieceGrams: threeInchRing.ringGrams,
    pieceDiameterMm: inToMm(3),
    doughTempC: 24,
  };

  it('26 cm pot, 2 in of oil at 375 °F, 3 in rings: oil stays at or above 350 °F and the batch is 2–5 pieces (common practice, no source; NIST °F→°C)', () => {
    const batch = fryBatchSize(check);
    expect(batch.pieces).toBeGreaterThanOrEqual(2);
    expect(batch.pieces).toBeLessThanOrEqual(5);
    expect(batch.oilAfterC).toBeGreaterThanOrEqual(fToC(350));
  });

  it('holds across the published specific heats: oil 2.0 (25 °C, Int. J. Food Properties 2008) to 2.4 J/gK (near 180 °C, from memory); dough 2.15–3.19 kJ/kgK (J. Food Eng. 1989)', () => {
    for (const oil of [2.0, 2.2, 2.4]) {
      for (const dough of [2.15, 2.7, 3.19]) {
        const batch = fryBatchSize({ ...check, oilSpecificHeatJPerGK: oil, doughSpecificHeatJPerGK: dough });
        expect(batch.pieces).toBeGreaterThanOrEqual(2);
        expect(batch.pieces).toBeLessThanOrEqual(5);
        expect(batch.oilAfterC).toBeGreaterThanOrEqual(fToC(350));
      }
    }
  });

  it('takes the most pieces the heat balance allows: one more would cool the oil below the floor, unless the pot is full', () => {
    const batch = fryBatchSize({ ...check, potDiameterMm: 600 });
    expect(batch.limitedBy).toBe('heat');
    const oneMore = oilTempAfterLoad({ oilGrams: batch.oilGrams, oilStartC: check.oilStartC, pieces: batch.pieces + 1, pieceGrams: check.pieceGrams, doughTempC: 24 });
    expect(oneMore).toBeLessThan(fToC(350));
  });

  it('energy balance: heat lost by the oil equals heat gained by the dough (first law)', () => {
    const after = oilTempAfterLoad({ oilGrams: 2500, oilStartC: 190, pieces: 3, pieceGrams: 60, doughTempC: 25, oilSpecificHeatJPerGK: 2.3, doughSpecificHeatJPerGK: 2.7 });
    expect(2500 * 2.3 * (190 - after)).toBeCloseTo(3 * 60 * 2.7 * (after - 25), 6);
  });
});

describe('fry plan', () => {
  const fryRings = (count: number, oilStartC = 190) =>
    planFry({
      potDiameterMm: 260, oilDepthMm: 75, oilStartC, oilFloorC: 177, doughTempC: 24,
      rings: { count, grams: 60, diameterMm: 76, secondsPerSide: 60 },
      holes: { count: 0, grams: 8, diameterMm: 25, secondsPerSide: 45 },
      recoveryMinutes: 1.5,
    });

  it('fat taken up is about 2 oz per dozen (Professional Baking, frying fat care)', () => {
    const plan = fryRings(12);
    expect(plan.oilAbsorbedGrams).toBeCloseTo(ozToG(2), 9);
  });

  it('minutes = batches × 2 sides + recovery between batches (about 1 min a side: doughnut equipment makers\' tips)', () => {
    const plan = fryRings(10);
    expect(plan.rings.batches).toBe(Math.ceil(10 / plan.rings.perBatch));
    expect(plan.minutes).toBeCloseTo(plan.rings.batches * 2 + (plan.rings.batches - 1) * 1.5, 9);
  });

  it('warns when the start temperature is outside 350–375 °F (doughnut equipment makers\' tips)', () => {
    const plan = fryRings(1, fToC(390));
    expect(plan.warnings.some((w) => w.includes('outside the usual'))).toBe(true);
  });
});
