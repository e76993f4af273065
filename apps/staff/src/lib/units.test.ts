import { describe, expect, it } from 'vitest';
import {
  formatMass,
  formatMinutes,
  formatPercent,
  formatTemp,
  formatVolume,
  LITRES_PER_US_QUART,
  tempFromUnit,
  tempToUnit,
  trimmed,
  unitsInText,
} from './units';
import { parseUnits } from './use-units';

describe('masses in grams or ounces', () => {
  it('one pound (453.59237 g, NIST SP 811 / Handbook 44 App. C) reads as 1 lb 0.0 oz', () => {
    expect(formatMass(453.59237, 'oz')).toBe('1 lb 0.0 oz');
  });

  it('one ounce (28.349523125 g, NIST SP 811) reads as 1.0 oz, and 16 oz less a hair rolls over to a pound', () => {
    expect(formatMass(28.349523125, 'oz')).toBe('1.0 oz');
    expect(formatMass(453.59237 - 0.5, 'oz')).toBe('1 lb 0.0 oz');
  });

  it('the PMQ worked scaling: 14 oz of salt is 396.89 g (1 oz = 28.349523125 g, NIST SP 811)', () => {
    // 800 oz flour × 1.75 % = 14 oz (PMQ Pizza Magazine, "Dough Doctor" baker's percent tip)
    expect(formatMass(800 * 0.0175 * 28.349523125, 'oz')).toBe('14.0 oz');
    expect(formatMass(800 * 0.0175 * 28.349523125, 'g')).toBe('397 g');
  });

  it('29 lb of water (464 oz, the same PMQ example) reads as 29 lb 0.0 oz', () => {
    expect(formatMass(464 * 28.349523125, 'oz')).toBe('29 lb 0.0 oz');
  });

  it('keeps a decimal below 10 g and under 1 oz, where a scale reads finer (common practice, no source)', () => {
    expect(formatMass(5.55, 'g')).toBe('5.6 g');
    expect(formatMass(3.0, 'g')).toBe('3 g');
    expect(formatMass(7221.6, 'g')).toBe('7,222 g');
    expect(formatMass(14.17476, 'oz')).toBe('0.50 oz'); // half an ounce, NIST SP 811
  });
});

describe('temperatures in °C or °F (NIST SP 811 App. B: °F = °C × 1.8 + 32)', () => {
  it.each([
    [176.67, 350],
    [185, 365],
    [190.56, 375],
    [65, 149],
    [4.44, 40],
  ])('%s °C reads as %s °F (derived from NIST SP 811 App. B)', (celsius, fahrenheit) => {
    expect(formatTemp(celsius, 'F')).toBe(`${fahrenheit} °F`);
    expect(tempToUnit(celsius, 'F')).toBeCloseTo(fahrenheit, 1);
  });

  it('a temperature typed in °F goes back to °C: 350 °F = 176.67 °C, 40 °F = 4.44 °C (NIST SP 811 App. B)', () => {
    expect(tempFromUnit(350, 'F')).toBeCloseTo(176.67, 2);
    expect(tempFromUnit(40, 'F')).toBeCloseTo(4.44, 2);
    expect(tempFromUnit(190, 'C')).toBe(190);
  });
});

describe('volumes, durations and percentages', () => {
  it('a US quart is 0.946352946 L exactly (NIST Handbook 44 App. C: 1 gal = 231 in³ = 3.785411784 L)', () => {
    expect(LITRES_PER_US_QUART).toBeCloseTo(0.946352946, 9);
    expect(formatVolume(3.785411784, 'oz')).toBe('3.8 L (4.0 US qt)');
    expect(formatVolume(3.14, 'g')).toBe('3.1 L');
  });

  it('minutes read as hours and minutes (60 min = 1 h, SI brochure table of non-SI units)', () => {
    expect(formatMinutes(45)).toBe('45 min');
    expect(formatMinutes(240)).toBe('4 h');
    expect(formatMinutes(299.11)).toBe('4 h 59 min');
    expect(formatMinutes(600)).toBe('10 h');
  });

  it("a baker's percentage keeps what matters and drops trailing zeros (common practice, no source)", () => {
    expect(formatPercent(1.8)).toBe('1.8 %');
    expect(formatPercent(51.2123)).toBe('51.2 %');
    expect(formatPercent(100, 2)).toBe('100 %');
    expect(trimmed(2.5, 2)).toBe('2.5');
  });
});

describe('the remembered choice of units', () => {
  it('reads a stored choice, and falls back to g and °C for anything unreadable (common practice, no source)', () => {
    expect(parseUnits('{"mass":"oz","temp":"F"}')).toEqual({ mass: 'oz', temp: 'F' });
    expect(parseUnits('{"mass":"lb"}')).toEqual({ mass: 'g', temp: 'C' });
    expect(parseUnits('not json')).toEqual({ mass: 'g', temp: 'C' });
    expect(parseUnits(null)).toEqual({ mass: 'g', temp: 'C' });
  });
});

describe('sentences from the plan in the chosen units', () => {
  const rule = 'whole large eggs (about 50 g without the shell), rounded for each mix; or weigh 1,240 g of beaten egg';
  it('grams become ounces in ounce mode: 50 g = 1.8 oz, 1,240 g = 2 lb 11.7 oz (1 oz = 28.349523125 g, NIST SP 811)', () => {
    expect(unitsInText(rule, { mass: 'oz', temp: 'C' })).toBe(
      'whole large eggs (about 1.8 oz without the shell), rounded for each mix; or weigh 2 lb 11.7 oz of beaten egg',
    );
    expect(unitsInText(rule, { mass: 'g', temp: 'C' })).toBe(rule);
  });
  it('kilograms too, and no grams are left in ounce mode; rates per g stay as written', () => {
    const text = unitsInText('a 4.5 kg dough and a 4 kg bowl; feed 20 g starter with 100 g flour; dough 1.18 g/cm³', { mass: 'oz', temp: 'C' });
    expect(text).toBe('a 9 lb 14.7 oz dough and a 8 lb 13.1 oz bowl; feed 0.71 oz starter with 3.5 oz flour; dough 1.18 g/cm³');
  });
  it('a temperature written in both scales keeps the chosen one: 65 °C (149 °F), NIST SP 811 App. B', () => {
    const text = 'Cook to 65 °C (149 °F); within 10 °C (18 °F) of the smoke point.';
    expect(unitsInText(text, { mass: 'g', temp: 'F' })).toBe('Cook to 149 °F; within 18 °F of the smoke point.');
    expect(unitsInText(text, { mass: 'g', temp: 'C' })).toBe('Cook to 65 °C; within 10 °C of the smoke point.');
  });
});
