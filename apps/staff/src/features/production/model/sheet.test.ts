import { describe, expect, it } from 'vitest';
import { scaleFormula, type BakePlan, type TimelineStep } from '@fryline/production';
import type { PlanMeta } from '@fryline/schemas';
import { countRows, cutoffWarning, dayInZone, formulaStatus, mixerLines, scheduleRows } from './sheet';

const step = (startsAt: string, endsAt: string, minutes: number): TimelineStep => ({
  step: 'cold-retard',
  title: 'Cold retard',
  startsAt,
  endsAt,
  minutes,
  lookFor: 'Firm and cold.',
});

describe('schedule clock times in the bake day’s own time zone', () => {
  it('shows a Denver step in Mountain time whatever the browser’s zone (UTC−7 in December, IANA tz database)', () => {
    const [row] = scheduleRows([step('2026-12-04T14:55:00Z', '2026-12-04T18:25:00Z', 210)], 'America/Denver');
    expect(row).toMatchObject({ starts: 'Fri 7:55 am', ends: '11:25 am' });
  });

  it('names the day again when a step runs past midnight (an overnight cold retard)', () => {
    const [row] = scheduleRows([step('2026-12-05T00:45:00Z', '2026-12-05T10:45:00Z', 600)], 'America/Denver');
    expect(row).toMatchObject({ starts: 'Fri 5:45 pm', ends: 'Sat 3:45 am' });
  });

  it('follows the spring-forward jump: 1:30 am + 60 min is 3:30 am on the second Sunday of March (US rule since 2007, from memory)', () => {
    // 2026-03-08 is the second Sunday of March: at 2:00 MST clocks go to 3:00 MDT.
    const [row] = scheduleRows([step('2026-03-08T08:30:00Z', '2026-03-08T09:30:00Z', 60)], 'America/Denver');
    expect(row).toMatchObject({ starts: 'Sun 1:30 am', ends: '3:30 am' });
  });

  it('tells calendar days apart in the zone, not in UTC (New York is UTC−5 in winter, IANA tz database)', () => {
    expect(dayInZone('2026-12-05T03:00:00Z', 'America/New_York')).toBe('2026-12-04');
    expect(dayInZone('2026-12-05T03:00:00Z', 'UTC')).toBe('2026-12-05');
  });
});

describe('pre-order cut-off against the schedule', () => {
  const meta = (cutoffAt: string) => ({ bakeDay: { id: 'd', date: '2026-12-05', place: 'Stall', timeZone: 'America/Denver', cutoffAt, capacity: { rings: 1, holes: 1 } } });

  it('warns when orders close after the starter must be fed', () => {
    const warning = cutoffWarning({ preorderCutoffAt: '2026-12-04T06:55:00-07:00' }, meta('2026-12-04T19:00:00Z'));
    expect(warning).toContain('Pre-orders close Fri 12 pm');
    expect(warning).toContain('closed by Fri 6:55 am');
  });

  it('says nothing when orders close in time', () => {
    expect(cutoffWarning({ preorderCutoffAt: '2026-12-04T06:55:00-07:00' }, meta('2026-12-04T13:55:00Z'))).toBeNull();
    expect(cutoffWarning({ preorderCutoffAt: '2026-12-04T06:55:00-07:00' }, meta('2026-12-04T12:00:00Z'))).toBeNull();
  });
});

describe('what goes into the mixer', () => {
  it('takes the levain out of the flour and water (Bread Bakers Guild of America layout: 1000 g flour, 10 % prefermented at 100 %, 80 % water → 900 g flour and 700 g water in the final dough)', () => {
    const dough = scaleFormula(
      {
        ingredients: [
          { name: 'Flour', percent: 100, kind: 'flour' },
          { name: 'Water', percent: 80, kind: 'water' },
          { name: 'Levain', percent: 20, kind: 'starter' },
          { name: 'Salt', percent: 2, kind: 'salt' },
        ],
        starterHydrationPercent: 100,
      },
      1820, // 1000 g of flour × (100 + 80 + 2) %
    );
    const lines = mixerLines(dough);
    const grams = Object.fromEntries(lines.map((line) => [line.name, line.grams]));
    expect(grams.Flour).toBeCloseTo(900, 6);
    expect(grams.Water).toBeCloseTo(700, 6);
    expect(grams.Levain).toBeCloseTo(200, 6);
    expect(grams.Salt).toBeCloseTo(20, 6);
    expect(lines.reduce((sum, line) => sum + line.grams, 0)).toBeCloseTo(1820, 6);
  });

  it('puts the milk roux in as one cooked paste of flour and 5× its weight in milk (1 : 5, common practice)', () => {
    const dough = scaleFormula(
      {
        ingredients: [
          { name: 'Flour', percent: 100, kind: 'flour' },
          { name: 'Milk', percent: 60, kind: 'milk' },
          { name: 'Eggs', percent: 10, kind: 'egg' },
          { name: 'Roux flour', percent: 5, kind: 'roux-flour' },
        ],
        rouxLiquidPerFlour: 5,
      },
      1700, // 1000 g of flour × 170 %
    );
    const lines = mixerLines(dough);
    const roux = lines.find((line) => line.name === 'Milk roux');
    expect(roux?.grams).toBeCloseTo(50 + 250, 6);
    expect(lines.find((line) => line.name === 'Milk')?.grams).toBeCloseTo(600 - 250, 6);
    expect(lines.find((line) => line.name === 'Flour')?.grams).toBeCloseTo(950, 6);
    // 100 g of egg is two large eggs of 50 g edible (USDA SR Legacy, NDB 01123)
    expect(lines.find((line) => line.name === 'Eggs')?.note).toBe('2 large eggs');
    expect(lines.some((line) => line.name.includes('roux') && line.name !== 'Milk roux')).toBe(false);
  });
});

describe('counts and the formula line', () => {
  it('lists ordered items rings first, then holes, with the menu’s glaze words', () => {
    const plan = {
      pieces: {
        byMenuItem: [
          { menuItemId: 'h', name: 'Sugar holes', kind: 'hole', glaze: null, quantity: 20 },
          { menuItemId: 'b', name: 'Maple', kind: 'ring', glaze: 'maple', quantity: 6 },
          { menuItemId: 'a', name: 'Lemon', kind: 'ring', glaze: 'lemon', quantity: 0 },
          { menuItemId: 'c', name: 'Cocoa', kind: 'ring', glaze: 'cocoa', quantity: 3 },
        ],
      },
      glaze: [{ glazeId: 'cocoa', name: 'Cocoa dip' }],
    } as unknown as Pick<BakePlan, 'pieces' | 'glaze'>;
    const meta = { menu: [{ id: 'b', name: 'Maple', kind: 'ring', glaze: 'Maple glaze', glazeRecipeId: 'maple' }] } as Pick<PlanMeta, 'menu'>;
    expect(countRows(plan, meta).map((row) => [row.name, row.glaze, row.quantity])).toEqual([
      ['Cocoa', 'Cocoa dip', 3],
      ['Maple', 'Maple glaze', 6],
      ['Sugar holes', 'Plain', 20],
    ]);
  });

  it('points out a newer formula version, and only a newer one', () => {
    expect(formulaStatus({ formula: { id: 'x', version: 2, note: 'More milk' }, latestFormulaVersion: 3 })).toEqual({
      label: 'formula version 2 (“More milk”)',
      newer: 3,
    });
    expect(formulaStatus({ formula: { id: 'x', version: 3, note: '' }, latestFormulaVersion: 3 }).newer).toBeNull();
    expect(formulaStatus({ formula: { id: null, version: 0, note: '' }, latestFormulaVersion: 0 }).label).toBe(
      'the built-in starting formula',
    );
  });
});
