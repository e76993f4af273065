import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cutLayout, cutPositions, cutsFromSheet, doughForPieces, ringsOnSheetOf, rollAndCut, sheetCutShare, sheetOfDough } from './cutting.js';

/** Densest packing of equal circles, π/(2√3) = 0.9068996821… (ProofWiki; OEIS A093766). */
const HEX_BOUND = 0.9068996821;

const sheetArb = fc.record({
  widthMm: fc.double({ min: 20, max: 700, noNaN: true }),
  lengthMm: fc.double({ min: 20, max: 700, noNaN: true }),
  cutterMm: fc.double({ min: 15, max: 120, noNaN: true }),
  gapMm: fc.double({ min: 0, max: 20, noNaN: true }),
});

describe('cutsFromSheet', () => {
  it('never exceeds the hexagonal packing bound π/(2√3) (ProofWiki; OEIS A093766)', () => {
    expect(Math.PI / (2 * Math.sqrt(3))).toBeCloseTo(HEX_BOUND, 10);
    fc.assert(
      fc.property(sheetArb, (sheet) => {
        const discArea = (Math.PI / 4) * sheet.cutterMm ** 2;
        expect(cutsFromSheet(sheet) * discArea).toBeLessThanOrEqual(HEX_BOUND * sheet.widthMm * sheet.lengthMm);
      }),
    );
  });

  it('counts real positions: every cut inside the sheet and no two cuts overlapping (arXiv:2403.10530: count, do not multiply)', () => {
    fc.assert(
      fc.property(sheetArb, (sheet) => {
        const pts = cutPositions(sheet);
        const r = sheet.cutterMm / 2;
        expect(pts.length).toBe(cutsFromSheet(sheet));
        for (const p of pts) {
          expect(p.xMm - r).toBeGreaterThanOrEqual(-1e-6);
          expect(p.yMm - r).toBeGreaterThanOrEqual(-1e-6);
          expect(p.xMm + r).toBeLessThanOrEqual(sheet.widthMm + 1e-6);
          expect(p.yMm + r).toBeLessThanOrEqual(sheet.lengthMm + 1e-6);
        }
        let closest = Infinity;
        for (let i = 0; i < pts.length; i++) {
          for (let j = i + 1; j < pts.length; j++) {
            closest = Math.min(closest, Math.hypot(pts[i]!.xMm - pts[j]!.xMm, pts[i]!.yMm - pts[j]!.yMm));
          }
        }
        expect(closest).toBeGreaterThanOrEqual(sheet.cutterMm + sheet.gapMm - 1e-6);
      }),
      { numRuns: 60 },
    );
  });

  it('takes the better of square and hex: 4 discs of diameter 1 in a 2 × 2 square (square grid), 5 hex rows beat 4 square rows (worked by hand)', () => {
    expect(cutsFromSheet({ widthMm: 2, lengthMm: 2, cutterMm: 1, gapMm: 0 })).toBe(4);
    expect(cutLayout({ widthMm: 2, lengthMm: 2, cutterMm: 1, gapMm: 0 }).arrangement).toBe('square');
    // 4.5 wide: 4 per row either way; 4.5 long: square 4 rows, hex rows 0.866 apart → 5 rows of 4, 4 (shifted), 4, 4, 4.
    const hex = cutLayout({ widthMm: 4.5, lengthMm: 4.5, cutterMm: 1, gapMm: 0 });
    expect(hex.arrangement).toBe('hex');
    expect(hex.count).toBe(20);
  });

  it('a sheet narrower than the cutter gives nothing', () => {
    expect(cutsFromSheet({ widthMm: 70, lengthMm: 500, cutterMm: 76, gapMm: 5 })).toBe(0);
  });
});

describe('the first roll as one sheet at the bench width (worked by hand)', () => {
  // 400 mm wide, 13 mm thick, dough 1.18 g/cm³ (Sourdough Biotechnology, Table 3.4): 1 mm of sheet holds
  // 400 × 13 × 1.18 / 1000 = 6.136 g, so 1840.8 g makes a sheet 300 mm long.
  const rolling = { widthMm: 400, thicknessMm: 13, gapMm: 5, doughDensityGPerCm3: 1.18 };
  it('a 76 mm cutter, 5 mm apart, fits 18 rings on a 400 × 300 mm sheet (worked by hand)', () => {
    expect(sheetOfDough(1840.8, rolling, 76).lengthMm).toBeCloseTo(300, 9);
    // Staggered rows, pitch 81 mm, rows 81·√3/2 = 70.15 mm apart: ⌊(300 − 76)/70.15⌋ + 1 = 4 rows;
    // ⌊(400 − 76)/81⌋ + 1 = 5 in the 1st and 3rd, ⌊(400 − 40.5 − 76)/81⌋ + 1 = 4 in the 2nd and 4th: 18.
    // Turned, or in a square grid: 3 rows of 5 = 15. So 18.
    expect(ringsOnSheetOf(1840.8, rolling, 76)).toBe(18);
  });
  it('plans no more first-roll rings than the sheet fits, even when the cut share would give more', () => {
    // 10 % scrap: the share alone gives ⌊1840.8 × 0.9 / 70⌋ = 23 rings, but only 18 fit. The re-roll gets
    // 1840.8 − 18 × 70 = 580.8 g and cuts ⌊580.8 × 0.9 / 70⌋ = 7: the 2 still wanted and 5 surplus.
    const settings = { doughGrams: 1840.8, ringGrams: 60, holeGrams: 10, scrapPercent: 10, rerolls: 1, ringsWanted: 20, extraHolesWanted: 0 };
    expect(rollAndCut(settings).rolls[0]!.rings).toBe(23);
    const r = rollAndCut({ ...settings, firstSheet: { rolling, cutterMm: 76 } });
    expect(r.rolls[0]!.rings).toBe(18);
    expect(r.rolls[0]!.ringsThatFit).toBe(18);
    expect(r.rolls[1]!.rings).toBe(7);
    expect(r.rings).toBe(25);
    expect(r.short).toEqual({ rings: 0, holes: 0 });
  });
});

describe('roll and re-roll (about 30 % scrap per roll; re-roll once or twice: trade press, culinary texts)', () => {
  it('first roll cuts about 70 %, the re-roll cuts about 70 % of the scrap (worked by hand)', () => {
    // disc = 60 + 10 g; 1000 g dough; 700 g usable → 10 discs; scrap 300 g; re-roll 210 g usable → 3 discs.
    const r = rollAndCut({ doughGrams: 1000, ringGrams: 60, holeGrams: 10, scrapPercent: 30, rerolls: 1, ringsWanted: 13, extraHolesWanted: 0 });
    expect(r.rolls.map((x) => x.rings)).toEqual([10, 3]);
    expect(r.rolls[0]!.scrapGrams).toBeCloseTo(300, 9);
    expect(r.scrapGrams).toBeCloseTo(90, 9);
    expect(r.rings).toBe(13);
    expect(r.holes).toBe(13);
    expect(r.short).toEqual({ rings: 0, holes: 0 });
  });

  it('the planned dough always cuts every ring and hole needed, and more pieces never mean less dough', () => {
    const arb = fc.record({
      ringGrams: fc.double({ min: 10, max: 120, noNaN: true }),
      holeGrams: fc.double({ min: 1, max: 30, noNaN: true }),
      scrapPercent: fc.double({ min: 0, max: 60, noNaN: true }),
      rerolls: fc.integer({ min: 0, max: 3 }),
      rings: fc.integer({ min: 0, max: 3000 }),
      holes: fc.integer({ min: 0, max: 3000 }),
      moreRings: fc.integer({ min: 0, max: 50 }),
      moreHoles: fc.integer({ min: 0, max: 50 }),
    });
    fc.assert(
      fc.property(arb, (a) => {
        const need = doughForPieces(a);
        const cut = rollAndCut({ ...a, doughGrams: need.doughGrams, ringsWanted: a.rings, extraHolesWanted: need.extraHoles });
        expect(cut.short).toEqual({ rings: 0, holes: 0 });
        expect(cut.rings).toBeGreaterThanOrEqual(a.rings);
        expect(cut.holes).toBeGreaterThanOrEqual(a.holes);
        const more = doughForPieces({ ...a, rings: a.rings + a.moreRings, holes: a.holes + a.moreHoles });
        expect(more.doughGrams).toBeGreaterThanOrEqual(need.doughGrams);
      }),
    );
  });

  it('refuses more than a handful of re-rolls', () => {
    expect(() => rollAndCut({ doughGrams: 1000, ringGrams: 60, holeGrams: 10, scrapPercent: 30, rerolls: 9, ringsWanted: 1, extraHolesWanted: 0 })).toThrow(/re-rolls/);
  });
});

describe('holes-only sheets (hexagonal packing: π/(2√3) = 0.9069, ProofWiki; OEIS A093766)', () => {
  const bench = { widthMm: 400, lengthMm: 600, cutterMm: 25, gapMm: 5 };

  it('small discs with gaps cut less than 63 % of a real sheet, and never more than the bound scaled by (d/(d+gap))²', () => {
    const share = sheetCutShare(bench);
    expect(share).toBeLessThan(0.63);
    expect(share).toBeLessThanOrEqual(HEX_BOUND * (25 / 30) ** 2);
    expect(share).toBeGreaterThan(0.5); // a real layout comes close to the bound on a big sheet
  });

  it('a holes-only order gets enough dough for what a real layout cuts, not for the 70 % a ring cutter manages', () => {
    const settings = { ringGrams: 62, holeGrams: 7.5, scrapPercent: 30, rerolls: 1, holeCutShare: sheetCutShare(bench) };
    const need = doughForPieces({ ...settings, rings: 0, holes: 300 });
    const naive = doughForPieces({ ...settings, holeCutShare: undefined, rings: 0, holes: 300 });
    expect(need.doughGrams).toBeGreaterThan(naive.doughGrams);
    const cut = rollAndCut({ ...settings, doughGrams: need.doughGrams, ringsWanted: 0, extraHolesWanted: need.extraHoles });
    expect(cut.short).toEqual({ rings: 0, holes: 0 });
    for (const roll of cut.rolls) expect(roll.extraHoles * 7.5).toBeLessThanOrEqual(roll.doughGrams * sheetCutShare(bench) + 1e-9);
  });
});
