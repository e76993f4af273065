import { describe, expect, it } from 'vitest';
import type { BakeDayView, MenuItemAdminView } from '@fryline/schemas';
import { ApiError } from '@fryline/ui/api-client';
import {
  clockIn,
  formPath,
  instantIn,
  latestBakeDay,
  newBakeDayDefaults,
  newBakeDayFormSchema,
  nextWindow,
  placeServerErrors,
  toCreateBakeDay,
  windowsForApi,
  type NewBakeDayValues,
} from './new-bake-day-form';

const ids = {
  vanilla: '0b6f3c1e-8a2d-4c57-9e41-2f7d5a9c0b11',
  maple: '5d2e7a90-13c4-4b8e-a6f2-9c0d1e3b4a22',
  holes: '9a4c2e71-6b3d-4f80-b5e9-0d1c2a3b4c33',
  retired: 'c3e1a5b7-2d4f-4a69-8b0c-1e2f3a4b5c44',
};

const item = (id: string, name: string, kind: 'ring' | 'hole', active = true): MenuItemAdminView => ({
  id,
  name,
  flavour: name,
  glaze: '',
  kind,
  surchargeCents: 0,
  allergens: ['wheat', 'milk', 'eggs'],
  active,
});

const menu = [
  item(ids.vanilla, 'Vanilla glaze', 'ring'),
  item(ids.maple, 'Maple', 'ring'),
  item(ids.holes, 'Sugared holes', 'hole'),
  item(ids.retired, 'Old flavour', 'ring', false),
];

const day = (over: Partial<BakeDayView>): BakeDayView => ({
  id: 'd1',
  date: '2026-11-28',
  place: 'Corner market',
  address: '1 Any Street',
  timeZone: 'America/Denver',
  status: 'done',
  ordersOpenAt: '2026-11-20T15:00:00Z',
  cutoffAt: '2026-11-27T01:00:00Z',
  remaining: { rings: 0, holes: 0 },
  capacity: { rings: 120, holes: 96 },
  // 9–10:30 am and 10:30–noon, Mountain Standard Time (UTC−7, IANA tz database)
  pickupWindows: [
    { id: 'w1', startsAt: '2026-11-28T16:00:00Z', endsAt: '2026-11-28T17:30:00Z', ordersLeft: null },
    { id: 'w2', startsAt: '2026-11-28T17:30:00Z', endsAt: '2026-11-28T19:00:00Z', ordersLeft: 4 },
  ],
  boxes: [
    { size: 'dozen', pieces: 12, priceCents: 3000, label: 'A dozen' },
    { size: 'holes', pieces: 15, priceCents: 850, label: 'A bag of holes' },
  ],
  menu: [],
  tax: { mode: 'included', rateBasisPoints: 0 },
  ...over,
});

const filled = (over: Partial<NewBakeDayValues> = {}): NewBakeDayValues => ({
  date: '2026-12-12',
  place: '  Corner market ',
  address: '1 Any Street',
  timeZone: 'America/Denver',
  windows: [
    { start: '09:00', end: '10:30', maxOrders: '' },
    { start: '10:30', end: '12:00', maxOrders: ' 20 ' },
  ],
  menuItemIds: [ids.vanilla, ids.holes],
  boxes: [
    { size: 'dozen', offered: true, pieces: 12, price: '30' },
    { size: 'half-dozen', offered: false, pieces: 6, price: '' },
    { size: 'holes', offered: true, pieces: 12, price: '$8.51' },
  ],
  ringCapacity: 110,
  holeCapacity: 110,
  ordersOpenAt: '',
  cutoffAt: '',
  publish: true,
  ...over,
});

const problemsOf = (values: NewBakeDayValues) => {
  const result = toCreateBakeDay(values);
  return result.ok ? {} : result.problems;
};

describe('times typed in the bake day’s own zone (IANA tz database)', () => {
  it('6 pm on a December evening in Denver is 18:00−07:00, Mountain Standard Time', () => {
    expect(instantIn('2026-12-10T18:00', 'America/Denver')).toBe('2026-12-10T18:00:00-07:00');
  });

  it('6 pm in June in Denver is 18:00−06:00: daylight saving, second Sunday in March to first Sunday in November (US Energy Policy Act of 2005)', () => {
    expect(instantIn('2026-06-10T18:00', 'America/Denver')).toBe('2026-06-10T18:00:00-06:00');
    expect(instantIn('2026-11-01T00:30', 'America/Denver')).toBe('2026-11-01T00:30:00-06:00');
    expect(instantIn('2026-11-02T00:30', 'America/Denver')).toBe('2026-11-02T00:30:00-07:00');
  });

  it('Phoenix keeps UTC−7 all year, and India is UTC+05:30 (IANA tz database)', () => {
    expect(instantIn('2026-06-10T18:00', 'America/Phoenix')).toBe('2026-06-10T18:00:00-07:00');
    expect(instantIn('2026-06-10T18:00', 'Asia/Kolkata')).toBe('2026-06-10T18:00:00+05:30');
  });

  it('reads an instant back as the zone’s clock time: 16:00 UTC is 9:00 in Denver in November (MST, UTC−7)', () => {
    expect(clockIn('2026-11-28T16:00:00Z', 'America/Denver')).toBe('09:00');
    expect(clockIn('2026-06-13T16:00:00Z', 'America/Denver')).toBe('10:00');
  });

  it('refuses what is not a local date and time', () => {
    expect(instantIn('', 'America/Denver')).toBeNull();
    expect(instantIn('2026-12-10', 'America/Denver')).toBeNull();
    expect(instantIn('2026-12-10T18:00', 'Mars/Olympus')).toBeNull();
  });
});

describe('pickup window rows as the API takes them', () => {
  it('keeps the clock times and makes a blank cap null and a typed one a number', () => {
    expect(
      windowsForApi([
        { start: '09:00', end: '10:00', maxOrders: '' },
        { start: '10:00', end: '11:00', maxOrders: '15' },
        { start: '11:00', end: '12:00', maxOrders: 'lots' },
      ]),
    ).toEqual([
      { start: '09:00', end: '10:00', maxOrders: null },
      { start: '10:00', end: '11:00', maxOrders: 15 },
      { start: '11:00', end: '12:00', maxOrders: Number.NaN },
    ]);
  });
});

describe('adding a pickup window', () => {
  it('starts where the last one ends and lasts an hour (60 min = 1 h, SI brochure table of non-SI units)', () => {
    expect(nextWindow([{ start: '09:00', end: '10:30', maxOrders: '5' }])).toEqual({ start: '10:30', end: '11:30', maxOrders: '' });
  });

  it('never runs past 23:59, and is blank when there is nothing to follow', () => {
    expect(nextWindow([{ start: '22:00', end: '23:30', maxOrders: '' }])).toEqual({ start: '23:30', end: '23:59', maxOrders: '' });
    expect(nextWindow([{ start: '22:00', end: '23:59', maxOrders: '' }])).toEqual({ start: '', end: '', maxOrders: '' });
    expect(nextWindow([{ start: '09:00', end: '', maxOrders: '' }])).toEqual({ start: '', end: '', maxOrders: '' });
    expect(nextWindow([])).toEqual({ start: '', end: '', maxOrders: '' });
  });
});

describe('where the form starts', () => {
  it('copies the latest bake day’s zone, windows and box prices; ticks the active menu; capacity from the equipment', () => {
    const values = newBakeDayDefaults({ latest: day({}), equipmentRings: 132, menuItems: menu, fallbackZone: 'Europe/Paris' });
    expect(values.timeZone).toBe('America/Denver');
    expect(values.windows).toEqual([
      { start: '09:00', end: '10:30', maxOrders: '' },
      { start: '10:30', end: '12:00', maxOrders: '' },
    ]);
    expect(values.menuItemIds).toEqual([ids.vanilla, ids.maple, ids.holes]);
    expect(values.boxes).toEqual([
      { size: 'dozen', offered: true, pieces: 12, price: '30.00' },
      { size: 'half-dozen', offered: false, pieces: 6, price: '' },
      { size: 'holes', offered: true, pieces: 15, price: '8.50' },
    ]);
    // each ring's centre is cut out as a hole: as many holes as rings (common practice, no source)
    expect([values.ringCapacity, values.holeCapacity]).toEqual([132, 132]);
    expect([values.ordersOpenAt, values.cutoffAt, values.publish]).toEqual(['', '', true]);
  });

  it('with no bake day before: the browser’s zone, one window, every box offered with no price yet', () => {
    const values = newBakeDayDefaults({ latest: undefined, equipmentRings: undefined, menuItems: menu, fallbackZone: 'Europe/Paris' });
    expect(values.timeZone).toBe('Europe/Paris');
    expect(values.windows).toHaveLength(1);
    expect(values.boxes.map((box) => [box.size, box.offered, box.pieces, box.price])).toEqual([
      ['dozen', true, 12, ''],
      ['half-dozen', true, 6, ''],
      ['holes', true, 12, ''],
    ]);
    expect(values.ringCapacity).toBeNaN();
  });

  it('does not offer the bag of holes when no holes are on the menu', () => {
    const values = newBakeDayDefaults({ latest: undefined, equipmentRings: 90, menuItems: menu.slice(0, 2), fallbackZone: 'UTC' });
    expect(values.boxes.find((box) => box.size === 'holes')?.offered).toBe(false);
  });

  it('the latest bake day is the one with the latest date, upcoming or past', () => {
    const a = day({ id: 'a', date: '2026-12-05' });
    const b = day({ id: 'b', date: '2026-12-06' });
    const c = day({ id: 'c', date: '2026-11-26' });
    expect(latestBakeDay([a, b], [c])?.id).toBe('b');
    expect(latestBakeDay(undefined, [c])?.id).toBe('c');
    expect(latestBakeDay([], undefined)).toBeUndefined();
  });
});

describe('the form’s values as the API body', () => {
  it('turns a filled form into CreateBakeDayInput: trimmed text, caps, cents, only the boxes offered', () => {
    expect(toCreateBakeDay(filled())).toEqual({
      ok: true,
      body: {
        date: '2026-12-12',
        place: 'Corner market',
        address: '1 Any Street',
        timeZone: 'America/Denver',
        windows: [
          { start: '09:00', end: '10:30', maxOrders: null },
          { start: '10:30', end: '12:00', maxOrders: 20 },
        ],
        menuItemIds: [ids.vanilla, ids.holes],
        boxes: [
          { size: 'dozen', pieces: 12, priceCents: 3000 },
          { size: 'holes', pieces: 12, priceCents: 851 }, // '$8.51' is 851 cents (ISO 4217: USD has 2 decimal places)
        ],
        ringCapacity: 110,
        holeCapacity: 110,
        acceptAboveEquipment: false,
        publish: true,
      },
    });
  });

  it('sends the opening and cut-off times as instants with the zone’s offset (MST, UTC−7, IANA tz database)', () => {
    const result = toCreateBakeDay(filled({ ordersOpenAt: '2026-12-01T08:00', cutoffAt: '2026-12-10T18:00', publish: false }));
    expect(result.ok && [result.body.ordersOpenAt, result.body.cutoffAt, result.body.publish]).toEqual([
      '2026-12-01T08:00:00-07:00',
      '2026-12-10T18:00:00-07:00',
      false,
    ]);
  });

  it('says what is wrong beside each field, all at once', () => {
    const problems = problemsOf(
      filled({
        date: '',
        place: ' ',
        windows: [
          { start: '10:00', end: '09:00', maxOrders: 'ten' },
          { start: '', end: '12:00', maxOrders: '0' },
        ],
        menuItemIds: [],
        boxes: [
          { size: 'dozen', offered: false, pieces: 12, price: '30' },
          { size: 'half-dozen', offered: true, pieces: 6, price: '' },
          { size: 'holes', offered: true, pieces: 0, price: '8,50' },
        ],
        ringCapacity: Number.NaN,
        cutoffAt: '2026-12-10',
      }),
    );
    expect(problems).toEqual({
      date: 'Pick a date',
      place: 'Name the place',
      'windows.0.end': 'A window ends after it starts',
      'windows.0.maxOrders': 'A whole number of orders, or leave it blank',
      'windows.1.start': 'Give a start time',
      'windows.1.maxOrders': 'At least 1',
      menuItemIds: 'Put at least one item on the menu',
      'boxes.1.price': 'Give the price',
      'boxes.2.price': 'Write the price as a number, like 16.50',
      'boxes.2.pieces': 'Between 1 and 60',
      ringCapacity: 'Write a whole number of rings',
      cutoffAt: 'Pick a date and a time',
    });
  });

  it('puts list-wide problems on the list: overlapping windows, no box offered', () => {
    const problems = problemsOf(
      filled({
        windows: [
          { start: '09:00', end: '11:00', maxOrders: '' },
          { start: '10:30', end: '12:00', maxOrders: '' },
        ],
        boxes: filled().boxes.map((box) => ({ ...box, offered: false })),
      }),
    );
    expect(problems).toEqual({ windows: 'Pickup windows must not overlap', boxes: 'Offer at least one box' });
  });

  it('as the resolver schema: the body out, or each problem at its field path', () => {
    expect(newBakeDayFormSchema.parse(filled()).boxes).toHaveLength(2);
    const failed = newBakeDayFormSchema.safeParse(filled({ place: '', holeCapacity: 2.5 }));
    expect(failed.error?.issues.map((issue) => [issue.path, issue.message])).toEqual([
      [['place'], 'Name the place'],
      [['holeCapacity'], 'Whole holes'],
    ]);
    const rows = newBakeDayFormSchema.safeParse(filled({ windows: [{ start: '09:00', end: '08:00', maxOrders: '' }] }));
    expect(rows.error?.issues[0]?.path).toEqual(['windows', 0, 'end']);
  });
});

describe('the API’s field paths, placed on the form', () => {
  const offered = [0, 2]; // dozen and bag of holes; no half dozen

  it.each([
    ['date', 'date'],
    ['timeZone', 'timeZone'],
    ['cutoffAt', 'cutoffAt'],
    ['windows.0.end', 'windows.0.end'],
    ['windows.3.maxOrders', 'windows.3.maxOrders'],
    ['windows', 'windows'],
    ['windows.1', 'windows'],
    ['menuItemIds', 'menuItemIds'],
    ['menuItemIds.2', 'menuItemIds'],
    ['boxes.1.priceCents', 'boxes.2.price'],
    ['boxes.0.pieces', 'boxes.0.pieces'],
    ['boxes', 'boxes'],
    ['boxes.5.priceCents', 'boxes'],
  ])('%s → %s', (api, form) => {
    expect(formPath(api, offered)).toBe(form);
  });

  it('has no field for what no input shows', () => {
    expect(formPath('acceptAboveEquipment', offered)).toBeNull();
    expect(formPath('somethingElse', offered)).toBeNull();
  });
});

describe('the API’s field errors, put beside the inputs', () => {
  const invalid = (fields: Record<string, string>) =>
    new ApiError({ status: 400, code: 'invalid', message: 'Not saved', details: { fields } });

  it('places each on its form field and returns what no field shows', () => {
    const placed: Array<[string, string]> = [];
    const left = placeServerErrors(
      invalid({ date: 'This date has passed', 'boxes.1.priceCents': 'Whole cents', publish: 'Expected true or false' }),
      [0, 2],
      (path, error) => placed.push([path, error.message]),
    );
    expect(placed).toEqual([
      ['date', 'This date has passed'],
      ['boxes.2.price', 'Whole cents'],
    ]);
    expect(left).toEqual(['Expected true or false']);
  });

  it('gives the error’s own message when it names no field', () => {
    const error = new ApiError({ status: 503, code: 'unavailable', message: 'Try again in a moment' });
    expect(placeServerErrors(error, [0], () => undefined)).toEqual(['Try again in a moment']);
  });
});
