import { describe, expect, it } from 'vitest';
import type { BakeDayView } from '@fryline/schemas';
import {
  canAddBox,
  draftProblems,
  emptyDraft,
  itemsForBox,
  previewPrice,
  reduceDraft,
  sanitizeDraft,
  type Draft,
  type DraftAction,
} from './draft';

// A made-up bake day for these checks.
const ringA = '00000000-0000-4000-8000-00000000000a';
const ringB = '00000000-0000-4000-8000-00000000000b';
const hole = '00000000-0000-4000-8000-00000000000c';
const windowId = '00000000-0000-4000-8000-0000000000f1';
const day: BakeDayView = {
  id: '00000000-0000-4000-8000-000000000d01',
  date: '2031-06-14',
  place: 'Test stall',
  address: '1 Nowhere Lane',
  timeZone: 'America/Chicago',
  status: 'open',
  ordersOpenAt: '2031-06-12T23:00:00Z',
  cutoffAt: '2031-06-13T19:00:00Z',
  remaining: { rings: 10, holes: 40 },
  capacity: { rings: 100, holes: 200 },
  pickupWindows: [{ id: windowId, startsAt: '2031-06-14T14:00:00Z', endsAt: '2031-06-14T15:00:00Z', ordersLeft: 3 }],
  boxes: [
    { size: 'dozen', pieces: 12, priceCents: 3000, label: 'Dozen' },
    { size: 'half-dozen', pieces: 6, priceCents: 1600, label: 'Half dozen' },
    { size: 'holes', pieces: 20, priceCents: 800, label: 'Bag of holes' },
  ],
  menu: [
    { id: ringA, name: 'Sugar ring', flavour: '', glaze: '', description: '', kind: 'ring', surchargeCents: 0, allergens: ['wheat'] },
    { id: ringB, name: 'Maple ring', flavour: '', glaze: '', description: '', kind: 'ring', surchargeCents: 50, allergens: ['wheat'] },
    { id: hole, name: 'Sugar holes', flavour: '', glaze: '', description: '', kind: 'hole', surchargeCents: 0, allergens: ['wheat'] },
  ],
  tax: { mode: 'added', rateBasisPoints: 825 },
};

function run(...actions: DraftAction[]): Draft {
  return actions.reduce((draft, action) => reduceDraft(day, draft, action), emptyDraft);
}

describe('filling boxes', () => {
  it('puts ring items in a half dozen and hole items in a bag (the trade’s box kinds, common practice, no source)', () => {
    expect(itemsForBox(day, 'half-dozen').map((i) => i.id)).toEqual([ringA, ringB]);
    expect(itemsForBox(day, 'holes').map((i) => i.id)).toEqual([hole]);
  });

  it('“fill the rest” tops a half dozen holding 2 up to 6 (half dozen = 6, common practice, no source)', () => {
    const draft = run({ type: 'addBox', size: 'half-dozen' });
    const key = draft.boxes[0]!.key;
    const filled = [
      { type: 'setQuantity', key, itemId: ringB, quantity: 2 },
      { type: 'fillRest', key, itemId: ringA },
    ].reduce<Draft>((d, a) => reduceDraft(day, d, a as DraftAction), draft);
    expect(filled.boxes[0]!.items).toEqual({ [ringB]: 2, [ringA]: 4 });
  });

  it('never lets a box hold more pieces than its size', () => {
    const draft = run({ type: 'addBox', size: 'half-dozen' });
    const key = draft.boxes[0]!.key;
    const over = reduceDraft(day, draft, { type: 'setQuantity', key, itemId: ringA, quantity: 9 });
    expect(over.boxes[0]!.items[ringA]).toBe(6);
  });

  it('stops a dozen when only 10 rings are left, but allows a half dozen', () => {
    expect(canAddBox(day, emptyDraft, 'dozen', day.remaining)).toBe(false);
    expect(canAddBox(day, emptyDraft, 'half-dozen', day.remaining)).toBe(true);
  });

  it('names what is missing before review', () => {
    const draft = run({ type: 'addBox', size: 'half-dozen' });
    expect(draftProblems(day, draft, day.remaining)).toEqual(['Choose a pickup window.', 'Fill your half dozen (0 of 6).']);
    const ready = [
      { type: 'chooseWindow', windowId },
      { type: 'fillRest', key: draft.boxes[0]!.key, itemId: ringA },
    ].reduce<Draft>((d, a) => reduceDraft(day, d, a as DraftAction), draft);
    expect(draftProblems(day, ready, day.remaining)).toEqual([]);
  });
});

describe('price preview', () => {
  it('half dozen $16 + 6 × $0.50 + bag $8 = $27.00; 8.25 % added tax = $2.23 (27.00 × 0.0825 = 2.2275, half up to the cent; worked by hand)', () => {
    const draft = run({ type: 'addBox', size: 'half-dozen' }, { type: 'addBox', size: 'holes' });
    const [half, bag] = draft.boxes;
    const filled = [
      { type: 'fillRest', key: half!.key, itemId: ringB },
      { type: 'fillRest', key: bag!.key, itemId: hole },
    ].reduce<Draft>((d, a) => reduceDraft(day, d, a as DraftAction), draft);
    expect(previewPrice(day, filled)).toEqual({ boxesCents: [1900, 800], subtotalCents: 2700, taxCents: 223, totalCents: 2923 });
  });
});

describe('a draft read back after sign-in', () => {
  it('keeps what the bake day still sells and drops the rest', () => {
    const stored = {
      pickupWindowId: 'gone',
      step: 'review',
      boxes: [
        { size: 'dozen', items: { [ringA]: 12 } },
        { size: 'baker-dozen', items: { [ringA]: 13 } },
        { size: 'holes', items: { [ringA]: 3, [hole]: 25 } },
      ],
    };
    const draft = sanitizeDraft(day, stored);
    expect(draft.pickupWindowId).toBeNull();
    expect(draft.step).toBe('review');
    expect(draft.boxes.map((b) => [b.size, b.items])).toEqual([
      ['dozen', { [ringA]: 12 }],
      ['holes', { [hole]: 20 }],
    ]);
  });

  it('starts empty from anything that is not a draft', () => {
    expect(sanitizeDraft(day, 'nonsense')).toEqual(emptyDraft);
    expect(sanitizeDraft(day, null)).toEqual(emptyDraft);
  });
});
