/**
 * Cutting rings from rolled dough.
 *
 * Sheet layouts: discs of the cutter's diameter, `gapMm` apart, entirely
 * inside a finite rectangular sheet. We count the positions of two real
 * layouts — a square grid and a hexagonal (staggered rows) layout, each in
 * both orientations — and take the best. We never multiply the sheet area by
 * the packing density bound π/(2√3): a finite sheet always falls below it.
 *
 * Rolling and re-rolling: each roll cuts at most (1 − scrap) of the dough it
 * starts with (rotary-cut doughs leave about 30 % to rework); the scraps are
 * pressed together and rolled again, a baker-set number of times (re-rolled
 * dough gets tougher, so once or twice at most).
 */
import { ProductionInputError, requireInRange, requireNonNegative, requirePositive, requireWholeNonNegative } from './errors.js';

const EPS = 1e-9;

export interface Sheet {
  widthMm: number;
  lengthMm: number;
  cutterMm: number;
  /** Space left between neighbouring cuts. */
  gapMm: number;
}

export type CutArrangement = 'square' | 'hex';

export interface CutLayout {
  count: number;
  arrangement: CutArrangement;
  /** True when rows run along the sheet's length instead of its width. */
  rotated: boolean;
  /** Centre-to-centre distance within a row. */
  pitchMm: number;
  /** Distance between row centre lines. */
  rowSpacingMm: number;
  rows: number;
  /** Discs in odd rows (1st, 3rd, …) and in even rows (shifted half a pitch in the hex layout). */
  perRow: { odd: number; even: number };
}

export interface CutPosition {
  xMm: number;
  yMm: number;
}

/** How many centres fit along a span when each disc needs `size` and centres step by `pitch`. */
function fitAlong(spanMm: number, sizeMm: number, pitchMm: number): number {
  return spanMm + EPS < sizeMm ? 0 : Math.floor((spanMm - sizeMm) / pitchMm + EPS) + 1;
}

function layoutFor(across: number, along: number, d: number, pitch: number, arrangement: CutArrangement, rotated: boolean): CutLayout {
  const rowSpacingMm = arrangement === 'square' ? pitch : (pitch * Math.sqrt(3)) / 2;
  const rows = fitAlong(along, d, rowSpacingMm);
  const odd = fitAlong(across, d, pitch);
  const even = arrangement === 'square' ? odd : fitAlong(across - pitch / 2, d, pitch);
  const count = rows === 0 ? 0 : Math.ceil(rows / 2) * odd + Math.floor(rows / 2) * even;
  return { count, arrangement, rotated, pitchMm: pitch, rowSpacingMm, rows, perRow: { odd, even } };
}

function validateSheet(sheet: Sheet): void {
  requirePositive('widthMm', sheet.widthMm);
  requirePositive('lengthMm', sheet.lengthMm);
  requirePositive('cutterMm', sheet.cutterMm);
  requireNonNegative('gapMm', sheet.gapMm);
}

/** The best of the square and hexagonal layouts (both orientations) for this sheet. */
export function cutLayout(sheet: Sheet): CutLayout {
  validateSheet(sheet);
  const pitch = sheet.cutterMm + sheet.gapMm;
  const candidates = [
    layoutFor(sheet.widthMm, sheet.lengthMm, sheet.cutterMm, pitch, 'hex', false),
    layoutFor(sheet.lengthMm, sheet.widthMm, sheet.cutterMm, pitch, 'hex', true),
    layoutFor(sheet.widthMm, sheet.lengthMm, sheet.cutterMm, pitch, 'square', false),
  ];
  return candidates.reduce((best, c) => (c.count > best.count ? c : best));
}

/** Number of discs that fit in the sheet. */
export function cutsFromSheet(sheet: Sheet): number {
  return cutLayout(sheet).count;
}

/** Centres of the cuts of `cutLayout(sheet)`, in sheet coordinates (x across the width, y along the length). */
export function cutPositions(sheet: Sheet): CutPosition[] {
  const layout = cutLayout(sheet);
  const r = sheet.cutterMm / 2;
  const positions: CutPosition[] = [];
  for (let row = 0; row < layout.rows; row++) {
    const even = row % 2 === 1;
    const n = even ? layout.perRow.even : layout.perRow.odd;
    const shift = even && layout.arrangement === 'hex' ? layout.pitchMm / 2 : 0;
    for (let i = 0; i < n; i++) {
      const across = r + shift + i * layout.pitchMm;
      const along = r + row * layout.rowSpacingMm;
      positions.push(layout.rotated ? { xMm: along, yMm: across } : { xMm: across, yMm: along });
    }
  }
  return positions;
}

export interface RollSettings {
  ringGrams: number;
  holeGrams: number;
  /** Share of each roll left as scrap to re-roll, percent (about 30). */
  scrapPercent: number;
  /** Times the scraps are re-rolled after the first roll (usually 1–2). */
  rerolls: number;
  /**
   * Share of a roll's dough that the ring cutter can take, when a real layout
   * on the bench sheet allows less than 1 − scrap (see `sheetCutShare`).
   * Default 1 − scrap.
   */
  ringCutShare?: number;
  /** The same for the hole cutter: small discs with gaps pack worse. Default 1 − scrap. */
  holeCutShare?: number;
}

/**
 * Share of a sheet's dough a cutter takes in the best real layout: cuts ×
 * disc area ÷ sheet area (never the packing bound: a finite sheet with gaps
 * falls below π/(2√3)).
 */
export function sheetCutShare(sheet: Sheet): number {
  const count = cutsFromSheet(sheet);
  return (count * Math.PI * sheet.cutterMm * sheet.cutterMm) / 4 / (sheet.widthMm * sheet.lengthMm);
}

function cutShares(settings: RollSettings): { ring: number; hole: number } {
  const keep = 1 - settings.scrapPercent / 100;
  const ring = Math.min(keep, settings.ringCutShare ?? keep);
  const hole = Math.min(keep, settings.holeCutShare ?? keep);
  return { ring, hole };
}

/** How a roll's dough is spread on the bench: a sheet this wide, this thick, cuts this far apart. */
export interface SheetRolling {
  widthMm: number;
  thicknessMm: number;
  gapMm: number;
  doughDensityGPerCm3: number;
}

/**
 * The sheet a mass of dough makes when rolled to the bench width and the set
 * thickness: length = mass ÷ (density × thickness × width).
 */
export function sheetOfDough(doughGrams: number, rolling: SheetRolling, cutterMm: number): Sheet {
  requireNonNegative('doughGrams', doughGrams);
  requirePositive('doughDensityGPerCm3', rolling.doughDensityGPerCm3);
  requirePositive('thicknessMm', rolling.thicknessMm);
  requirePositive('widthMm', rolling.widthMm);
  const lengthMm = (doughGrams * 1000) / (rolling.doughDensityGPerCm3 * rolling.thicknessMm * rolling.widthMm);
  return { widthMm: rolling.widthMm, lengthMm, cutterMm, gapMm: rolling.gapMm };
}

/** Rings a real layout fits on the sheet that a mass of dough makes (0 for no dough). */
export function ringsOnSheetOf(doughGrams: number, rolling: SheetRolling, cutterMm: number): number {
  const sheet = sheetOfDough(doughGrams, rolling, cutterMm);
  return sheet.lengthMm > 0 ? cutsFromSheet(sheet) : 0;
}

export interface RollInput extends RollSettings {
  doughGrams: number;
  /**
   * When set, the first roll is one sheet at the bench width: it never plans
   * more rings than `ringsOnSheetOf` fits on it (the rest come from re-rolls).
   */
  firstSheet?: { rolling: SheetRolling; cutterMm: number };
  /** Rings the orders need; more are cut as surplus if the dough allows. */
  ringsWanted: number;
  /** Holes needed beyond the ring centres, cut with the hole cutter. */
  extraHolesWanted: number;
}

export interface RollStep {
  /** 1 = first roll, 2 = first re-roll, … */
  roll: number;
  doughGrams: number;
  rings: number;
  extraHoles: number;
  scrapGrams: number;
  /** First roll with `firstSheet` only: rings a real layout fits on its sheet (the rings above never exceed it). */
  ringsThatFit?: number;
}

export interface RollResult {
  rolls: RollStep[];
  rings: number;
  /** Ring centres (when the cutter has a centre) plus extra holes. */
  holes: number;
  extraHoles: number;
  /** Dough left after the last roll. */
  scrapGrams: number;
  /** Rings and extra holes the dough could not give (0 when the dough suffices). */
  short: { rings: number; holes: number };
}

function validateRoll(settings: RollSettings): void {
  requirePositive('ringGrams', settings.ringGrams);
  requireNonNegative('holeGrams', settings.holeGrams);
  requireInRange('scrapPercent', settings.scrapPercent, 0, 90);
  requireWholeNonNegative('rerolls', settings.rerolls);
  if (settings.rerolls > 5) throw new ProductionInputError('rerolls', 'more than 5 re-rolls makes the dough too tough');
  if (settings.ringCutShare !== undefined) requireInRange('ringCutShare', settings.ringCutShare, 0.05, 1);
  if (settings.holeCutShare !== undefined) requireInRange('holeCutShare', settings.holeCutShare, 0.05, 1);
}

/**
 * First roll and re-rolls. Each roll: cut the rings still needed, then the
 * extra holes still needed, then (once the orders are covered) surplus rings
 * from what is left of the cuttable part; the rest is scrap for the next roll.
 */
export function rollAndCut(input: RollInput): RollResult {
  validateRoll(input);
  requireNonNegative('doughGrams', input.doughGrams);
  requireWholeNonNegative('ringsWanted', input.ringsWanted);
  requireWholeNonNegative('extraHolesWanted', input.extraHolesWanted);
  if (input.extraHolesWanted > 0 && input.holeGrams === 0) {
    throw new ProductionInputError('holeGrams', 'extra holes need a hole cutter (holeGrams > 0)');
  }
  const disc = input.ringGrams + input.holeGrams;
  const share = cutShares(input);
  let dough = input.doughGrams;
  let ringsLeft = input.ringsWanted;
  let holesLeft = input.extraHolesWanted;
  const rolls: RollStep[] = [];
  for (let roll = 1; roll <= input.rerolls + 1; roll++) {
    // Dough "footprint" left on the sheet: a ring takes disc/share of it, a hole hole/share.
    let footprint = dough;
    const fit = roll === 1 && input.firstSheet ? ringsOnSheetOf(dough, input.firstSheet.rolling, input.firstSheet.cutterMm) : Infinity;
    let rings = Math.min(ringsLeft, fit, Math.floor((footprint * share.ring) / disc + EPS));
    footprint -= (rings * disc) / share.ring;
    const extraHoles = holesLeft > 0 ? Math.min(holesLeft, Math.floor((Math.max(0, footprint) * share.hole) / input.holeGrams + EPS)) : 0;
    footprint -= extraHoles > 0 ? (extraHoles * input.holeGrams) / share.hole : 0;
    ringsLeft -= rings;
    holesLeft -= extraHoles;
    if (ringsLeft === 0 && holesLeft === 0) {
      const surplus = Math.min(fit - rings, Math.floor((Math.max(0, footprint) * share.ring) / disc + EPS));
      rings += surplus;
    }
    const scrapGrams = Math.max(0, dough - rings * disc - extraHoles * input.holeGrams);
    const step: RollStep = { roll, doughGrams: dough, rings, extraHoles, scrapGrams };
    if (fit !== Infinity) step.ringsThatFit = fit;
    rolls.push(step);
    dough = scrapGrams;
  }
  const rings = rolls.reduce((s, r) => s + r.rings, 0);
  const extraHoles = rolls.reduce((s, r) => s + r.extraHoles, 0);
  return {
    rolls,
    rings,
    holes: (input.holeGrams > 0 ? rings : 0) + extraHoles,
    extraHoles,
    scrapGrams: dough,
    short: { rings: ringsLeft, holes: holesLeft },
  };
}

export interface DoughNeed {
  doughGrams: number;
  /** Mass of the pieces the orders need (rings with their centres, plus extra holes). */
  piecesGrams: number;
  extraHoles: number;
  /** Fraction of the dough that ends up cut into pieces at best: 1 − scrap^(rolls). */
  bestYield: number;
}

/**
 * Dough that `rollAndCut` turns into the pieces: each kind's mass over its
 * own best yield, D = ⌈(R·w + w/kR)/yR + (X·h + (h + w)/kH)/yH⌉, with R rings
 * of disc w, X extra holes of h, k a cutter's share of a roll (1 − scrap, or
 * less when a real layout of small discs packs worse), y = 1 − (1 − k)^(n+1)
 * over n re-rolls. Each unfinished roll wastes less than one piece of each
 * kind beyond its scrap, which the pads cover. D grows with the rings and the
 * holes (a ring added takes at most one extra hole away), so more orders
 * never mean less dough; the property tests check both.
 */
export function doughForPieces(settings: RollSettings & { rings: number; holes: number }): DoughNeed {
  validateRoll(settings);
  requireWholeNonNegative('rings', settings.rings);
  requireWholeNonNegative('holes', settings.holes);
  const disc = settings.ringGrams + settings.holeGrams;
  const s = settings.scrapPercent / 100;
  const extraHoles = Math.max(0, settings.holes - settings.rings);
  if (settings.holes > 0 && settings.holeGrams === 0) {
    throw new ProductionInputError('holeGrams', 'holes need a hole cutter (holeGrams > 0)');
  }
  const piecesGrams = settings.rings * disc + extraHoles * settings.holeGrams;
  // Rings and extra holes each need their mass over their own best yield (a cutter's share of every roll,
  // re-rolls included); each unfinished roll wastes less than one piece of each kind, which the pads cover.
  // Adding a ring adds its disc and takes at most one extra hole away, so more orders never mean less dough.
  const share = cutShares(settings);
  const yieldOf = (k: number) => 1 - (1 - k) ** (settings.rerolls + 1);
  const ringYield = yieldOf(share.ring);
  const holeYield = yieldOf(share.hole);
  const ringPart = settings.rings > 0 ? (settings.rings * disc + disc / share.ring) / ringYield : 0;
  const holePart = extraHoles > 0 ? (extraHoles * settings.holeGrams + (settings.holeGrams + disc) / share.hole) / holeYield : 0;
  const doughGrams = piecesGrams === 0 ? 0 : Math.ceil(ringPart + holePart);
  const bestYield = piecesGrams === 0 ? ringYield : piecesGrams / ((settings.rings * disc) / ringYield + (extraHoles * settings.holeGrams) / holeYield);
  return { doughGrams, piecesGrams, extraHoles, bestYield };
}

/** The step (grams) of the one grid every planned dough weight sits on: a sixteenth of a ring or less. */
export const DOUGH_GRID_GRAMS = 5;

/**
 * The least dough, on one fixed grid of `DOUGH_GRID_GRAMS`, that `rollAndCut`
 * (with the first sheet's real fit) turns into every piece. The search starts
 * below any dough that could work (the pieces' mass over the best yield of
 * either cutter) and walks up the grid. Because the grid and the start do
 * not depend on how the estimate of `doughForPieces` lands, one more piece
 * never plans less dough: a ring in place of an extra hole is never easier
 * to cut, and the search for it starts no lower. (Stepping up from the
 * estimate instead could, by up to a piece's dough, where an extra hole's
 * allowance is larger than a ring's.)
 */
export function leastDoughThatCuts(
  settings: RollSettings & { rings: number; holes: number; firstSheet?: RollInput['firstSheet'] },
): { need: DoughNeed; rolled: RollResult } {
  const { firstSheet, rings, holes, ...roll } = settings;
  const need = doughForPieces({ ...roll, rings, holes });
  const cut = (doughGrams: number) => rollAndCut({ ...roll, doughGrams, ringsWanted: rings, extraHolesWanted: need.extraHoles, ...(firstSheet ? { firstSheet } : {}) });
  if (need.piecesGrams === 0) return { need: { ...need, doughGrams: 0 }, rolled: cut(0) };
  const share = cutShares(roll);
  const bestYield = 1 - (1 - Math.max(share.ring, share.hole)) ** (roll.rerolls + 1);
  const disc = roll.ringGrams + roll.holeGrams;
  const most = need.doughGrams + 1000 * Math.max(1, Math.ceil(disc));
  let doughGrams = Math.max(DOUGH_GRID_GRAMS, Math.floor(need.piecesGrams / bestYield / DOUGH_GRID_GRAMS) * DOUGH_GRID_GRAMS);
  let rolled = cut(doughGrams);
  while ((rolled.short.rings > 0 || rolled.short.holes > 0) && doughGrams < most) {
    doughGrams += DOUGH_GRID_GRAMS;
    rolled = cut(doughGrams);
  }
  if (rolled.short.rings > 0 || rolled.short.holes > 0) throw new Error('internal: no dough on the grid cut every piece');
  return { need: { ...need, doughGrams }, rolled };
}
