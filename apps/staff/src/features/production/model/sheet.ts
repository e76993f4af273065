/**
 * What the production sheet shows, worked out from the plan the API sends:
 * plain data for the sheet's components, kept apart so it can be checked
 * without a browser. No bake maths here; that lives in @fryline/production.
 */
import type { BakePlan, ScaledFormula, TimelineStep } from '@fryline/production';
import { formatClock, formatMoment } from '@fryline/ui/format';
import type { PlanMeta } from '@fryline/schemas';

/** The calendar day of an instant in a time zone, as "2026-12-04". */
export function dayInZone(iso: string, timeZone: string): string {
  return new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' }).format(
    new Date(iso),
  );
}

export interface ScheduleRow {
  step: TimelineStep['step'];
  title: string;
  /** "Fri 7:55 am". */
  starts: string;
  /** "11:25 am", or "Sat 3:45 am" when the step ends on another day. */
  ends: string;
  minutes: number;
  lookFor: string;
}

/** The timeline as clock times in the bake day's own time zone. */
export function scheduleRows(timeline: readonly TimelineStep[], timeZone: string): ScheduleRow[] {
  return timeline.map((step) => ({
    step: step.step,
    title: step.title,
    starts: formatMoment(step.startsAt, timeZone),
    ends:
      dayInZone(step.startsAt, timeZone) === dayInZone(step.endsAt, timeZone)
        ? formatClock(step.endsAt, timeZone)
        : formatMoment(step.endsAt, timeZone),
    minutes: step.minutes,
    lookFor: step.lookFor,
  }));
}

/**
 * When the bake day's pre-orders close later than the schedule allows (the
 * starter must be fed before the last orders are in), say so.
 */
export function cutoffWarning(plan: Pick<BakePlan, 'preorderCutoffAt'>, meta: Pick<PlanMeta, 'bakeDay'>): string | null {
  const { cutoffAt, timeZone } = meta.bakeDay;
  if (Date.parse(cutoffAt) <= Date.parse(plan.preorderCutoffAt)) return null;
  return `Pre-orders close ${formatMoment(cutoffAt, timeZone)}, but this schedule needs them closed by ${formatMoment(plan.preorderCutoffAt, timeZone)}: orders after that may not fit tonight's dough. Move the cut-off earlier, or shorten a step.`;
}

export interface CountRow {
  menuItemId: string;
  name: string;
  kind: 'ring' | 'hole';
  glaze: string;
  quantity: number;
}

/** Tonight's orders by menu item: rings first, then holes, each by name. */
export function countRows(plan: Pick<BakePlan, 'pieces' | 'glaze'>, meta: Pick<PlanMeta, 'menu'>): CountRow[] {
  const menuGlaze = new Map(meta.menu.map((item) => [item.id, item.glaze]));
  const glazeNames = new Map(plan.glaze.map((g) => [g.glazeId, g.name]));
  return plan.pieces.byMenuItem
    .filter((line) => line.quantity > 0)
    .map((line) => ({
      menuItemId: line.menuItemId,
      name: line.name,
      kind: line.kind,
      glaze: menuGlaze.get(line.menuItemId) || (line.glaze ? glazeNames.get(line.glaze) ?? line.glaze : 'Plain'),
      quantity: line.quantity,
    }))
    .sort((a, b) => (a.kind === b.kind ? a.name.localeCompare(b.name) : a.kind === 'ring' ? -1 : 1));
}

export interface MixerLine {
  name: string;
  grams: number;
  /** A figure that goes with the line: the whole egg count. */
  note?: string;
  /** Where the line comes from, for the screen: "ripe, from the starter build below". */
  hint?: string;
}

/**
 * What goes into the mixer. The milk roux's flour and milk go in together as
 * one cooked paste, so they show as one line.
 */
export function mixerLines(dough: Pick<ScaledFormula, 'finalDough' | 'eggs' | 'roux'>): MixerLine[] {
  const lines: MixerLine[] = [];
  for (const row of dough.finalDough) {
    if (row.kind === 'roux-milk') continue;
    if (row.kind === 'roux-flour') {
      const total = dough.roux?.totalGrams ?? row.grams;
      lines.push({ name: 'Milk roux', grams: total, hint: 'cooked and cooled, from the milk roux below' });
    } else if (row.kind === 'starter') {
      lines.push({ name: row.name, grams: row.grams, hint: 'ripe, from the starter build below' });
    } else if (row.kind === 'egg' && dough.eggs) {
      lines.push({ name: row.name, grams: row.grams, note: `${dough.eggs.count} large ${dough.eggs.count === 1 ? 'egg' : 'eggs'}` });
    } else {
      lines.push({ name: row.name, grams: row.grams });
    }
  }
  return lines;
}

/** The formula note under the heading, and whether a newer version waits. */
export function formulaStatus(meta: Pick<PlanMeta, 'formula' | 'latestFormulaVersion'>): { label: string; newer: number | null } {
  const { version, note } = meta.formula;
  const label = version === 0 ? 'the built-in starting formula' : `formula version ${version}${note ? ` (“${note}”)` : ''}`;
  return { label, newer: meta.latestFormulaVersion > version ? meta.latestFormulaVersion : null };
}
