import { describe, expect, it } from 'vitest';
import { formFromSettings, percentText, settingsFormSchema } from './settings-form';

const view = {
  shopName: 'Brindle & Bell Doughnuts',
  timeZone: 'America/Denver',
  currency: 'usd' as const,
  tax: { mode: 'added' as const, rateBasisPoints: 825 },
  holdMinutes: 10,
  noShowGraceMinutes: 30,
  refundPolicy: 'Cancel before orders close for a full refund.',
  updatedAt: null,
};

describe('the shop settings form', () => {
  // a basis point is a hundredth of a percent (common practice, no source): 8.25 % = 825 bp
  it.each([
    ['8.25', 825],
    ['8.5', 850],
    ['7', 700],
    ['0', 0],
    ['12.75 %', 1275],
  ])('reads a typed rate of %s %% as %i basis points, on the digits', (typed, bp) => {
    const parsed = settingsFormSchema.parse({ ...formFromSettings(view), tax: { mode: 'added', rateBasisPoints: typed } });
    expect(parsed.tax.rateBasisPoints).toBe(bp);
  });

  it.each(['8.255', '-1', 'eight', '', '60'])('refuses %j as a rate', (typed) => {
    const parsed = settingsFormSchema.safeParse({ ...formFromSettings(view), tax: { mode: 'added', rateBasisPoints: typed } });
    expect(parsed.success).toBe(false);
  });

  it('shows stored settings back as typed text, and reads them back unchanged', () => {
    const form = formFromSettings(view);
    expect(form.tax.rateBasisPoints).toBe('8.25');
    expect(percentText(5)).toBe('0.05');
    const { updatedAt: _ignored, ...input } = view;
    expect(settingsFormSchema.parse(form)).toEqual(input);
  });

  it('refuses minutes that are not whole, or out of range', () => {
    expect(settingsFormSchema.safeParse({ ...formFromSettings(view), holdMinutes: '7.5' }).success).toBe(false);
    expect(settingsFormSchema.safeParse({ ...formFromSettings(view), holdMinutes: '2' }).success).toBe(false);
    expect(settingsFormSchema.safeParse({ ...formFromSettings(view), noShowGraceMinutes: '' }).success).toBe(false);
  });
});
