/**
 * The staged line on the bake day: sheets are rolled and cut in turn, the
 * pieces go onto proofing trays, each tray is proofed so that it is ready
 * when the fryer is, batches go into the oil one after another, and glazing
 * follows the fryer batch by batch while frying goes on.
 *
 * Model (relative minutes; planBake anchors it to the clock):
 * 1. Sheets are rolled one after another at the baker's minutes per sheet;
 *    the scraps of a dough's sheets are pressed together, rested and rolled
 *    again after them (re-rolled pieces proof later).
 * 2. A tray can only start proofing when one of the trays is free again
 *    (its pieces went into the oil), and is ready a proof later.
 * 3. The fryer takes the trays in order, a batch at a time; each batch waits
 *    for the thermometer (the pot's recovery, see fry.ts).
 * 4. Then every tray's proof is set to end exactly when its first batch goes
 *    in, and every sheet is rolled as late as that allows (cut pieces that
 *    wait for their tray's turn stay covered in the fridge).
 * 5. Each batch cools, then is glazed at the baker's seconds per piece by one
 *    person, in frying order; packing starts when the last piece is glazed.
 */
import { afterTopUpC, recoveryMinutesFrom, runBatch, type BatchRun, type Fryer } from './fry.js';
/** A ring or a hole (the same words as planBake's order lines). */
type PieceKind = 'ring' | 'hole';

export interface LineSheetInput {
  dough: string | null;
  /** Mix the dough comes from (1-based), or null for a re-roll of several mixes' scraps. */
  mix: number | null;
  /** 1 = first roll, 2 = first re-roll, … */
  roll: number;
  doughGrams: number;
  rings: number;
  /** Pieces for the hole trays: ring centres and extra holes. */
  holes: number;
}

export interface LineSettings {
  rollMinutesPerSheet: number;
  rerollRestMinutes: number;
  proofMinutes: number;
  trays: number;
  ringsPerTray: number;
  holesPerTray: number;
  coolMinutes: number;
  glazeSecondsPerPiece: number;
  packSecondsPerBox: number;
  boxes: number;
}

export interface LineSheet extends LineSheetInput {
  sheet: number;
  from: number;
  until: number;
}

export interface LineTray {
  /** 1, 2, … in frying order. */
  tray: number;
  sheet: number;
  kind: PieceKind;
  dough: string | null;
  mix: number | null;
  pieces: number;
  cutAt: number;
  proofFrom: number;
  /** Its first batch goes in. */
  fryAt: number;
}

/**
 * The fry batches in frying order, one column per field (a big bake has
 * thousands of batches; columns keep the line from building an object for
 * each). Batch i (0-based) came from tray `tray[i]` (1-based).
 */
export interface LineBatches {
  count: number;
  tray: Int32Array;
  /** 0 ring, 1 hole. */
  kind: Uint8Array;
  pieces: Int32Array;
  at: Float64Array;
  fryMinutes: Float64Array;
  lowestC: Float64Array;
  recoveryMinutes: Float64Array;
  topUpGramsBefore: Float64Array;
}

export interface StagedLine {
  sheets: LineSheet[];
  trays: LineTray[];
  batches: LineBatches;
  fryFrom: number;
  fryUntil: number;
  glazeFrom: number;
  glazeUntil: number;
  packFrom: number;
  packUntil: number;
  absorbedGrams: number;
  topUpGrams: number;
  /** Most trays proofing at once. */
  traysInUse: number;
}

interface TrayDraft {
  /** Sheets whose pieces are on it (a part-filled tray takes the next sheet's pieces of the same dough). */
  sheets: number[];
  sheet: number;
  kind: PieceKind;
  dough: string | null;
  mix: number | null;
  pieces: number;
}

export function stageLine(sheetsIn: LineSheetInput[], settings: LineSettings, fryer: Fryer, glazed: (batchIndex: number, kind: PieceKind, dough: string | null, pieces: number) => number): StagedLine {
  const roll = settings.rollMinutesPerSheet;
  const rest = settings.rerollRestMinutes;
  // 1. Rolling as early as possible, and the trays each sheet fills.
  const ready: number[] = [];
  const drafts: TrayDraft[] = [];
  const sheets: LineSheet[] = [];
  let cursor = 0;
  const open: Record<PieceKind, number | null> = { ring: null, hole: null };
  for (let i = 0; i < sheetsIn.length; i++) {
    const s = sheetsIn[i]!;
    const prev = sheetsIn[i - 1];
    const from = prev && s.roll > 1 && prev.roll !== s.roll ? cursor + rest : cursor;
    const until = from + roll;
    cursor = until;
    sheets.push({ dough: s.dough, mix: s.mix, roll: s.roll, doughGrams: s.doughGrams, rings: s.rings, holes: s.holes, sheet: i + 1, from, until });
    const fill = (kind: PieceKind, count: number, perTray: number) => {
      let left = count;
      const o = open[kind];
      if (o !== null && left > 0 && drafts[o]!.dough === s.dough) {
        const take = Math.min(left, perTray - drafts[o]!.pieces);
        drafts[o]!.pieces += take;
        drafts[o]!.sheets.push(i + 1);
        drafts[o]!.sheet = i + 1;
        ready[o] = until;
        left -= take;
      }
      for (; left > 0; left -= perTray) {
        drafts.push({ sheets: [i + 1], sheet: i + 1, kind, dough: s.dough, mix: s.mix, pieces: Math.min(perTray, left) });
        ready.push(until);
        open[kind] = drafts.length - 1;
      }
      if (open[kind] !== null && drafts[open[kind]!]!.pieces >= perTray) open[kind] = null;
    };
    fill('ring', s.rings, settings.ringsPerTray);
    fill('hole', s.holes, settings.holesPerTray);
  }

  // 2–3. Proof when a tray is free, fry in order with the pot's recovery; glaze behind the fryer.
  const slots = Math.max(1, settings.trays);
  const emptiedAt = new Float64Array(drafts.length);
  const firstBatchAt = new Float64Array(drafts.length);
  let total = 0;
  for (const t of drafts) total += Math.ceil(t.pieces / fryer[t.kind].perBatch);
  const batches: LineBatches = {
    count: total,
    tray: new Int32Array(total),
    kind: new Uint8Array(total),
    pieces: new Int32Array(total),
    at: new Float64Array(total),
    fryMinutes: new Float64Array(total),
    lowestC: new Float64Array(total),
    recoveryMinutes: new Float64Array(total),
    topUpGramsBefore: new Float64Array(total),
  };
  const runs = new Map<number, BatchRun>(); // most batches are full: one run per kind and size
  const runFor = (kind: PieceKind, pieces: number) => {
    const key = (kind === 'ring' ? 0 : 100_000) + pieces;
    let run = runs.get(key);
    if (!run) runs.set(key, (run = runBatch(fryer, kind, pieces)));
    return run;
  };
  let fryCursor = -Infinity;
  let glazeCursor = -Infinity;
  let glazeFrom = Infinity;
  let lost = 0;
  let absorbedGrams = 0;
  let topUpGrams = 0;
  let pendingTopUp = 0;
  let i = 0;
  for (let j = 0; j < drafts.length; j++) {
    const t = drafts[j]!;
    const slotFree = j >= slots ? emptiedAt[j - slots]! : -Infinity;
    const proofDone = Math.max(ready[j]!, slotFree) + settings.proofMinutes;
    const per = fryer[t.kind].perBatch;
    const fatPerPiece = fryer[t.kind].fatGramsPerPiece;
    let last = 0;
    for (let left = t.pieces; left > 0; left -= per, i++) {
      const pieces = Math.min(per, left);
      const at = Math.max(fryCursor, proofDone);
      const run = runFor(t.kind, pieces);
      const fat = pieces * fatPerPiece;
      absorbedGrams += fat;
      lost += fat;
      let outC = run.endC;
      batches.topUpGramsBefore[i] = pendingTopUp;
      pendingTopUp = 0;
      if (fryer.topUpEveryGrams > 0 && lost + fat >= fryer.topUpEveryGrams) {
        pendingTopUp = lost;
        topUpGrams += lost;
        outC = afterTopUpC(fryer, outC, lost);
        lost = 0;
      }
      const recovery = recoveryMinutesFrom(fryer, outC);
      const glazeMinutes = (glazed(i, t.kind, t.dough, pieces) * settings.glazeSecondsPerPiece) / 60;
      const glazeStart = Math.max(at + run.fryMinutes + settings.coolMinutes, glazeCursor);
      glazeCursor = glazeStart + glazeMinutes;
      if (glazeMinutes > 0 && glazeStart < glazeFrom) glazeFrom = glazeStart;
      batches.tray[i] = j + 1;
      batches.kind[i] = t.kind === 'ring' ? 0 : 1;
      batches.pieces[i] = pieces;
      batches.at[i] = at;
      batches.fryMinutes[i] = run.fryMinutes;
      batches.lowestC[i] = run.lowestC;
      batches.recoveryMinutes[i] = recovery;
      if (left === t.pieces) firstBatchAt[j] = at;
      last = at;
      fryCursor = at + run.fryMinutes + recovery;
    }
    emptiedAt[j] = last;
  }
  // A top-up planned after the last batch is not needed.
  if (pendingTopUp > 0) topUpGrams -= pendingTopUp;
  if (total > 0) batches.recoveryMinutes[total - 1] = 0;

  // 4. Proof ends as the tray's first batch goes in; sheets rolled just in time.
  const trays: LineTray[] = drafts.map((t, j) => ({
    tray: j + 1, sheet: t.sheet, kind: t.kind, dough: t.dough, mix: t.mix, pieces: t.pieces,
    cutAt: 0, proofFrom: firstBatchAt[j]! - settings.proofMinutes, fryAt: firstBatchAt[j]!,
  }));
  const deadline = new Array<number>(sheets.length).fill(Infinity);
  trays.forEach((t, j) => {
    for (const sh of drafts[j]!.sheets) deadline[sh - 1] = Math.min(deadline[sh - 1]!, t.proofFrom);
  });
  for (let i = sheets.length - 1; i >= 0; i--) {
    const s = sheets[i]!;
    const next = sheets[i + 1];
    const gapToNext = next && next.roll > 1 && next.roll !== s.roll ? rest : 0;
    const latest = Math.min(deadline[i]!, next ? next.from - gapToNext : Infinity);
    const until = Number.isFinite(latest) ? Math.max(s.until, latest) : s.until;
    s.until = until;
    s.from = until - roll;
  }
  for (const t of trays) t.cutAt = sheets[t.sheet - 1]!.until;

  // Packing follows the glazing.
  const fryFrom = total > 0 ? batches.at[0]! : 0;
  const fryUntil = total > 0 ? batches.at[total - 1]! + batches.fryMinutes[total - 1]! : 0;
  const glazeUntil = total > 0 ? Math.max(glazeCursor, fryUntil + settings.coolMinutes) : 0;
  const packFrom = glazeUntil;
  const packUntil = packFrom + (settings.boxes * settings.packSecondsPerBox) / 60;

  // Most trays proofing at the same time (a check on the slot rule above).
  // Filled in a loop: Float64Array.from with a map function goes through the iterator protocol, element by element.
  const starts = new Float64Array(trays.length);
  for (let j = 0; j < trays.length; j++) starts[j] = trays[j]!.proofFrom;
  starts.sort();
  const ends = emptiedAt.slice().sort();
  let traysInUse = 0;
  for (let i = 0, e = 0; i < starts.length; i++) {
    while (e < ends.length && ends[e]! <= starts[i]! + 1e-9) e++;
    traysInUse = Math.max(traysInUse, i + 1 - e);
  }
  return {
    sheets, trays, batches, fryFrom, fryUntil,
    glazeFrom: Number.isFinite(glazeFrom) ? glazeFrom : glazeUntil,
    glazeUntil, packFrom, packUntil, absorbedGrams, topUpGrams, traysInUse,
  };
}
