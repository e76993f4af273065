/**
 * Unit helpers. Inside the package masses are grams, lengths millimetres,
 * temperatures °C and money integer cents; these are the only conversions.
 * Exact factors (NIST SP 811, NIST Handbook 44 Appendix C):
 * 1 lb = 453.59237 g, 1 oz = 1/16 lb = 28.349523125 g, 1 in = 25.4 mm,
 * °C = (°F − 32) / 1.8 and a temperature interval of 1 °F = 5/9 °C.
 */
import { ProductionInputError, requireFinite } from './errors.js';

export const GRAMS_PER_POUND = 453.59237;
export const GRAMS_PER_OUNCE = GRAMS_PER_POUND / 16;
export const MM_PER_INCH = 25.4;

/** Absolute temperature, °F → °C. */
export function fToC(fahrenheit: number): number {
  return (requireFinite('fahrenheit', fahrenheit) - 32) / 1.8;
}

/** Absolute temperature, °C → °F. */
export function cToF(celsius: number): number {
  return requireFinite('celsius', celsius) * 1.8 + 32;
}

/** Temperature difference (interval), °F → °C: no 32° offset. */
export function fDeltaToC(fahrenheitDelta: number): number {
  return requireFinite('fahrenheitDelta', fahrenheitDelta) / 1.8;
}

/** Temperature difference (interval), °C → °F: no 32° offset. */
export function cDeltaToF(celsiusDelta: number): number {
  return requireFinite('celsiusDelta', celsiusDelta) * 1.8;
}

export function gToOz(grams: number): number {
  return requireFinite('grams', grams) / GRAMS_PER_OUNCE;
}

export function ozToG(ounces: number): number {
  return requireFinite('ounces', ounces) * GRAMS_PER_OUNCE;
}

export function gToLb(grams: number): number {
  return requireFinite('grams', grams) / GRAMS_PER_POUND;
}

export function lbToG(pounds: number): number {
  return requireFinite('pounds', pounds) * GRAMS_PER_POUND;
}

export function inToMm(inches: number): number {
  return requireFinite('inches', inches) * MM_PER_INCH;
}

export function mmToIn(millimetres: number): number {
  return requireFinite('millimetres', millimetres) / MM_PER_INCH;
}

/**
 * The one half-up rounding: num ÷ den to a whole number, halves up
 * (0.5 → 1, 2.5 → 3). With integer num and den > 0 (the price and tax sums)
 * there is no floating-point drift; with den = 1 it rounds an amount already
 * worked out, as each cost sum does once at its end. @fryline/schemas
 * re-exports it for money.
 */
export function roundHalfUp(num: number, den = 1): number {
  requireFinite('amount', num);
  requireFinite('divisor', den);
  if (den <= 0) throw new ProductionInputError('divisor', `must be more than 0 (got ${den})`);
  return Math.floor((2 * num + den) / (2 * den));
}

/** A temperature in words for the baker's texts, both scales: "188 °C (370 °F)". */
export function tempInBothScales(celsius: number): string {
  return `${Math.round(celsius)} °C (${Math.round(cToF(celsius))} °F)`;
}
