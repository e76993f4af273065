/**
 * How the staff screens show masses, temperatures, volumes and durations.
 * The maths works in grams and °C; these turn its figures into what the
 * baker chose to read (g or oz, °C or °F) and back, and nothing else.
 */
import { GRAMS_PER_OUNCE, GRAMS_PER_POUND, cToF, fToC } from '@fryline/production';

export type MassUnit = 'g' | 'oz';
export type TempUnit = 'C' | 'F';

export interface Units {
  mass: MassUnit;
  temp: TempUnit;
}

export const DEFAULT_UNITS: Units = { mass: 'g', temp: 'C' };

/** Litres in one US liquid quart (231 in³ a gallon, 1 in = 25.4 mm). */
export const LITRES_PER_US_QUART = (231 * 25.4 ** 3) / 1e6 / 4;

const OUNCES_PER_POUND = GRAMS_PER_POUND / GRAMS_PER_OUNCE;

/**
 * Rounds to `digits` decimals as written, halves up: 5.55 → 5.6 (toFixed
 * alone gives 5.5, because 5.55 is stored as 5.5499…).
 */
export function roundTo(value: number, digits: number): number {
  const text = String(value);
  if (/e/i.test(text)) return Math.round(value * 10 ** digits) / 10 ** digits; // tiny or huge: no halves to worry about
  return Number(`${Math.round(Number(`${text}e${digits}`))}e-${digits}`);
}

/** Up to `digits` decimals, with trailing zeros dropped: 1.80 → "1.8", 2.00 → "2". */
export function trimmed(value: number, digits: number): string {
  const fixed = roundTo(value, digits).toFixed(digits);
  return digits > 0 ? fixed.replace(/\.?0+$/, '') : fixed;
}

/**
 * Grams as the baker reads them. In grams: whole grams from 10 g up, one
 * decimal below (salt and flavourings). In ounces: two decimals under 1 oz,
 * one decimal up to a pound, then "2 lb 3.5 oz".
 */
export function formatMass(grams: number, unit: MassUnit): string {
  if (unit === 'g') return `${grams < 10 ? trimmed(grams, 1) : Math.round(grams).toLocaleString('en-US')} g`;
  const ounces = grams / GRAMS_PER_OUNCE;
  if (ounces < 1) return `${roundTo(ounces, 2).toFixed(2)} oz`;
  const tenths = Math.round(ounces * 10);
  if (tenths < OUNCES_PER_POUND * 10) return `${(tenths / 10).toFixed(1)} oz`;
  const pounds = Math.floor(tenths / (OUNCES_PER_POUND * 10));
  const rest = (tenths - pounds * OUNCES_PER_POUND * 10) / 10;
  return `${pounds} lb ${rest.toFixed(1)} oz`;
}

/** °C into the chosen scale (absolute temperatures, not differences). */
export function tempToUnit(celsius: number, unit: TempUnit): number {
  return unit === 'C' ? celsius : cToF(celsius);
}

/** A temperature typed in the chosen scale, back to °C. */
export function tempFromUnit(value: number, unit: TempUnit): number {
  return unit === 'C' ? value : fToC(value);
}

export function tempSymbol(unit: TempUnit): string {
  return unit === 'C' ? '°C' : '°F';
}

/** "190 °C", "374 °F": whole degrees, as a thermometer is read. */
export function formatTemp(celsius: number, unit: TempUnit): string {
  return `${Math.round(tempToUnit(celsius, unit))} ${tempSymbol(unit)}`;
}

/** "3.1 L", with US quarts beside it for someone reading ounces. */
export function formatVolume(litres: number, massUnit: MassUnit): string {
  const metric = `${roundTo(litres, 1).toFixed(1)} L`;
  return massUnit === 'g' ? metric : `${metric} (${roundTo(litres / LITRES_PER_US_QUART, 1).toFixed(1)} US qt)`;
}

/** "45 min", "4 h", "4 h 59 min": rounded to the nearest minute. */
export function formatMinutes(minutes: number): string {
  const whole = Math.round(minutes);
  const h = Math.floor(whole / 60);
  const m = whole % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}

/** A baker's percentage or a share: "1.8 %", "51.2 %". */
export function formatPercent(percent: number, digits = 1): string {
  return `${trimmed(percent, digits)} %`;
}

const TEMP_PAIR = /(-?\d+(?:\.\d+)?) °C \((-?\d+(?:\.\d+)?) °F\)/g;
const MASS_IN_TEXT = /(\d{1,3}(?:,\d{3})+|\d+(?:\.\d+)?) ?(kg|g)\b(?![/·])/g;

/**
 * A sentence from the plan (a note, a warning, what to look for) in the
 * chosen units: every "N g" and "N kg" as `formatMass` writes it, and every
 * "X °C (Y °F)" pair as the chosen scale alone. The plan writes temperatures
 * as both scales (differences too, "10 °C (18 °F)"), so no temperature is
 * converted here, only picked. Rates such as "g/cm³" are left as they are.
 */
export function unitsInText(text: string, units: Units): string {
  const temps = text.replace(TEMP_PAIR, (_, c: string, f: string) => (units.temp === 'C' ? `${c} °C` : `${f} °F`));
  if (units.mass === 'g') return temps;
  return temps.replace(MASS_IN_TEXT, (_, figure: string, unit: string) =>
    formatMass(Number(figure.replace(/,/g, '')) * (unit === 'kg' ? 1000 : 1), units.mass),
  );
}
