import { describe, expect, it } from 'vitest';
import { DEFAULT_EQUIPMENT, DEFAULT_FORMULA } from './defaults.js';
import { doughFatShare } from './formula.js';
import {
  absorbedFatGrams, batchLowestC, friedPieceGrams, fryBatchSize, oilDensity, oilMassGrams, oilTempAfterLoad, oilVolumeLitres, pieceHeatJ, piecesInPot, planFry,
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

  it('takes the most pieces the heat balance allows: one more would dip the oil below the floor, unless the pot is full', () => {
    const pot = { massGrams: 4500, material: 'cast-iron' as const };
    const burner = { watts: 2500, efficiencyPercent: 40 };
    const batch = fryBatchSize({ ...check, potDiameterMm: 600, pot, burner });
    expect(batch.limitedBy).toBe('heat');
    const lowest = (n: number) => batchLowestC({ startC: check.oilStartC, loadJ: n * batch.pieceHeatJ, netWatts: batch.netWatts, seconds: 60, heatCapacityJPerK: batch.heatCapacityJPerK });
    expect(lowest(batch.pieces)).toBeGreaterThanOrEqual(fToC(350) - 1e-9);
    expect(lowest(batch.pieces + 1)).toBeLessThan(fToC(350));
  });

  it('a piece draws its warming to 100 °C plus the steam of the water it loses (steam tables: 2257 J/g at 100 °C)', () => {
    // 60 g at 24 °C, c 2.7 J/gK, 10 % water lost: 60·2.7·76 + 6·2257 J.
    expect(pieceHeatJ({ grams: 60, doughTempC: 24, doughSpecificHeatJPerGK: 2.7, waterLossPercent: 10 })).toBeCloseTo(60 * 2.7 * 76 + 6 * 2257, 6);
  });

  it('the pot and the burner carry more pieces than the oil alone (first law: heat store C = m·c summed)', () => {
    const alone = fryBatchSize({ ...check, potDiameterMm: 600 });
    const withKit = fryBatchSize({ ...check, potDiameterMm: 600, pot: { massGrams: 4500, material: 'cast-iron' }, burner: { watts: 2500 } });
    expect(withKit.heatCapacityJPerK).toBeCloseTo(alone.heatCapacityJPerK + 4500 * 0.45, 6); // cast iron 0.45 J/gK (from memory)
    expect(withKit.byHeat).toBeGreaterThan(alone.byHeat);
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

  it('fat taken up is 15–25 % of the fried weight (BAKERpedia doughnut frying) and grows with the piece', () => {
    const small = absorbedFatGrams({ grams: 30 });
    const large = absorbedFatGrams({ grams: 60 });
    expect(large).toBeCloseTo(2 * small, 9);
    for (const grams of [8, 30, 60, 90]) {
      const share = absorbedFatGrams({ grams }) / friedPieceGrams({ grams });
      expect(share).toBeGreaterThanOrEqual(0.15);
      expect(share).toBeLessThanOrEqual(0.25);
    }
    // Derived from USDA SR Legacy 18255: a 62 g ring losing about 10 % water takes up about 16 g.
    expect(absorbedFatGrams({ grams: 62 })).toBeGreaterThan(14);
    expect(absorbedFatGrams({ grams: 62 })).toBeLessThan(18);
    const plan = fryRings(12);
    expect(plan.oilAbsorbedGrams).toBeCloseTo(12 * absorbedFatGrams({ grams: 60 }), 9);
    expect(plan.oilAbsorbedGrams).toBeGreaterThan(2 * ozToG(2)); // the old 2-oz-a-dozen figure was 2–4× low
  });

  it('minutes = batches × 2 sides + the handling time between batches when the burner keeps up (about 1 min a side: doughnut equipment makers\' tips)', () => {
    const plan = planFry({
      potDiameterMm: 260, oilDepthMm: 75, oilStartC: 190, oilFloorC: 182, doughTempC: 24,
      pot: { massGrams: 4500 }, burner: { watts: 6000, efficiencyPercent: 50 },
      rings: { count: 10, grams: 60, diameterMm: 76, secondsPerSide: 60 },
      holes: { count: 0, grams: 8, diameterMm: 25, secondsPerSide: 45 },
      recoveryMinutes: 0.5,
    });
    expect(plan.rings.batches).toBe(Math.ceil(10 / plan.rings.perBatch));
    expect(plan.minutes).toBeCloseTo(plan.rings.batches * 2 + (plan.rings.batches - 1) * 0.5, 9);
  });

  it('a weak burner makes the oil wait: recovery = C·ΔT / P (first law)', () => {
    const weak = planFry({
      potDiameterMm: 260, oilDepthMm: 75, oilStartC: 190, oilFloorC: 182, doughTempC: 24,
      burner: { watts: 500, efficiencyPercent: 40 },
      rings: { count: 9, grams: 60, diameterMm: 76, secondsPerSide: 60 },
      holes: { count: 0, grams: 8, diameterMm: 25, secondsPerSide: 45 },
      recoveryMinutes: 0.5,
    });
    expect(weak.minutes).toBeGreaterThan(weak.rings.batches * 2 + (weak.rings.batches - 1) * 0.5);
    const heatUp = weak.heatUpMinutes;
    expect(heatUp).toBeCloseTo((weak.heatCapacityJPerK * (190 - 20)) / 200 / 60, 6);
  });

  it('the oil stands higher hot: the freeboard check uses the density at frying temperature (JAOCS 1999: −0.00064 g/cm³ per °C)', () => {
    const plan = planFry({
      potDiameterMm: 260, oilDepthMm: 100, oilStartC: 190, oilFloorC: 182, doughTempC: 24, potHeightMm: 160,
      rings: { count: 3, grams: 60, diameterMm: 76, secondsPerSide: 60 },
      holes: { count: 0, grams: 8, diameterMm: 25, secondsPerSide: 45 },
      recoveryMinutes: 0.5,
    });
    expect(plan.oil.hotDepthWithBatchMm).toBeGreaterThan(100 * (0.92 / (0.92 - 0.00064 * 170)) - 1e-9);
    expect(plan.warnings.some((w) => w.includes('to the rim'))).toBe(true);
  });

  it('warns when the start temperature is outside 350–375 °F (doughnut equipment makers\' tips)', () => {
    const plan = fryRings(1, fToC(390));
    expect(plan.warnings.some((w) => w.includes('outside the usual'))).toBe(true);
  });
});

describe('a glazed ring against USDA SR Legacy 18255 (glazed yeast doughnut, medium 3¾ in: 60–64 g, 22.70 g fat per 100 g; hole 13 g)', () => {
  // A 3 in cutter puffs to about 3¾ in (our puff factor 1.25); rolled ⅜ in thick, with a thin glaze of about 10 g (from memory).
  const ring = pieceMass({ outerMm: inToMm(3), innerMm: inToMm(1), thicknessMm: inToMm(3 / 8), densityGPerCm3: 1.18 });
  const dough = ring.ringGrams;
  const fat = absorbedFatGrams({ grams: dough });
  const glazed = friedPieceGrams({ grams: dough }) + 10;

  it('weighs what a medium glazed doughnut weighs', () => {
    expect(inToMm(3) * 1.25).toBeCloseTo(inToMm(3.75), 9);
    expect(glazed).toBeGreaterThanOrEqual(60);
    expect(glazed).toBeLessThanOrEqual(64);
  });

  it('carries the fat a glazed yeast doughnut carries: the dough\'s own (USDA fat per 100 g of milk 3.25, egg 9.51, butter 81.11, bread flour 1.66) plus what it takes up', () => {
    const share = (dough * doughFatShare(DEFAULT_FORMULA) + fat) / glazed;
    expect(share * 100).toBeGreaterThan(22.7 - 1.5);
    expect(share * 100).toBeLessThan(22.7 + 1.5);
  });

  it('our default hole (25 mm cutter, 13 mm thick) fried and glazed weighs about a USDA hole, 13 g', () => {
    const hole = pieceMass({ outerMm: DEFAULT_EQUIPMENT.cutter.outerMm, innerMm: DEFAULT_EQUIPMENT.cutter.innerMm, thicknessMm: 13, densityGPerCm3: 1.18 }).holeGrams;
    const glazedHole = friedPieceGrams({ grams: hole }) + 4; // our vanilla glaze: 4 g a hole
    expect(Math.abs(glazedHole - 13)).toBeLessThanOrEqual(1.5);
  });
});
