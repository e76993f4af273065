/**
 * Glaze recipes in the equipment form: ids made from names, a new recipe's
 * starting values, and the form's wording for the checks the settings
 * schema leaves to zod's defaults.
 */
import type { z } from 'zod';
import type { ProductionSettingsInput } from '@fryline/schemas';

export type GlazeValues = ProductionSettingsInput['glazes'][number];

export const MAX_GLAZES = 30;
export const MAX_GLAZE_PARTS = 10;
const ID_LENGTH = 40;

/** Lower-case letters and digits, runs of anything else as one dash: "Crème brûlée" → "creme-brulee". */
function slug(name: string): string {
  return name
    .normalize('NFKD')
    .replace(/\p{M}/gu, '') // accents split off by NFKD
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '');
}

function cut(text: string, length: number): string {
  return text.slice(0, length).replace(/-+$/, '');
}

/**
 * The id a new glaze gets from its name: lower-case letters, digits and
 * dashes, 2 to 40 long, with "-2", "-3"… when another glaze has it.
 */
export function glazeIdFrom(name: string, taken: Iterable<string>): string {
  const used = new Set(taken);
  const own = slug(name);
  const base = cut(own.length >= 2 ? own : ['glaze', own].filter(Boolean).join('-'), ID_LENGTH);
  if (!used.has(base)) return base;
  for (let n = 2; ; n += 1) {
    const candidate = `${cut(base, ID_LENGTH - String(n).length - 1)}-${n}`;
    if (!used.has(candidate)) return candidate;
  }
}

/** A new recipe to fill in: one part to name, and our own round starting amounts. */
export function newGlaze(name: string, taken: Iterable<string>): GlazeValues {
  return {
    id: glazeIdFrom(name, taken),
    name: name.trim(),
    gramsPerRing: 12,
    gramsPerHole: 4,
    parts: [{ name: '', parts: 1 }],
    extraPercent: 15,
    allergens: [],
  };
}

/** Each part's share of the glaze by weight, in percent (0 while the parts add up to nothing). */
export function partShares(parts: ReadonlyArray<{ parts: number }>): number[] {
  const total = parts.reduce((sum, part) => sum + (Number.isFinite(part.parts) && part.parts > 0 ? part.parts : 0), 0);
  return parts.map((part) => (total > 0 && Number.isFinite(part.parts) && part.parts > 0 ? (part.parts / total) * 100 : 0));
}

/**
 * The form's words where the settings schema has no message of its own
 * (empty or long names, too few or too many parts or glazes). Passed to the
 * resolver; the schema's own messages win wherever it has them.
 */
export const settingsMessages: z.core.$ZodErrorMap = (issue) => {
  const last = issue.path?.at(-1);
  const glazePart = issue.path?.length === 5;
  if (issue.code === 'too_small' && issue.origin === 'string') return glazePart ? 'Name the part' : 'Name the glaze';
  if (issue.code === 'too_big' && issue.origin === 'string') return `Keep it to ${String(issue.maximum)} characters`;
  if (issue.code === 'too_small' && last === 'parts') return 'A glaze needs at least one part';
  if (issue.code === 'too_big' && last === 'parts') return `A glaze can have up to ${MAX_GLAZE_PARTS} parts`;
  if (issue.code === 'too_big' && last === 'glazes') return `Up to ${MAX_GLAZES} glazes`;
  return undefined;
};
