import { describe, expect, it } from 'vitest';
import { colord, extend } from 'colord';
import a11yPlugin from 'colord/plugins/a11y';
import { chartColors, chartText } from './chart-frame';

extend([a11yPlugin]);

// Contrast ratios as WCAG 2.1 defines them (relative luminance, (L1 + 0.05) / (L2 + 0.05)), computed by colord's a11y plugin.
const card = '#ffffff';

describe('the sales charts’ colours', () => {
  it.each(Object.entries(chartColors))('the %s bars (%s) meet the white card at 3:1 or more (WCAG 2.1, 1.4.11 non-text contrast)', (_name, colour) => {
    expect(colord(colour).contrast(card)).toBeGreaterThanOrEqual(3);
  });

  it.each(Object.entries({ legend: chartText.ink, axes: chartText.muted }))('the %s text (%s) meets the white card at 4.5:1 or more (WCAG 2.1, 1.4.3 text contrast)', (_name, colour) => {
    expect(colord(colour).contrast(card)).toBeGreaterThanOrEqual(4.5);
  });

  it('the two series of each chart differ in hue, not only in lightness, so side by side they read as two', () => {
    for (const [a, b] of [[chartColors.now, chartColors.before], [chartColors.sold, chartColors.capacity]] as const) {
      const hue = (c: string) => colord(c).toHsl().h;
      const apart = Math.abs(hue(a) - hue(b));
      expect(Math.min(apart, 360 - apart)).toBeGreaterThan(30);
    }
  });
});
