/**
 * The equipment form's fields, in the order the owner meets them, and how
 * the stored settings become the form's values. Temperatures stay in °C in
 * the form's values; only their inputs show the chosen scale.
 */
import type { Path } from 'react-hook-form';
import { scheduleStepIds, type ProductionSettingsInput } from '@fryline/schemas';
import type { CapacityLimit } from '@fryline/production';
import { isApiError, putFieldErrors } from '@fryline/ui/api-client';

export type SettingsPath = Path<ProductionSettingsInput>;

export interface SettingsField {
  name: SettingsPath;
  label: string;
  /** Shown after the label: "mm", "g", "min". Temperatures get the chosen scale instead. */
  unit?: string;
  help?: string;
  /** May be left blank. */
  optional?: boolean;
  /** Whole numbers only. */
  whole?: boolean;
  temperature?: boolean;
}

export interface SettingsGroup {
  id: string;
  title: string;
  intro?: string;
  fields: SettingsField[];
}

const stepLabels: Record<(typeof scheduleStepIds)[number], string> = {
  'build-starter': 'Build the starter',
  'cook-cool-roux': 'Cook and cool the milk roux',
  mix: 'Mix to windowpane',
  'bulk-fermentation': 'Bulk fermentation (at the temperature below)',
  'shape-and-chill': 'Shape and into the fridge',
  'cold-retard': 'Cold retard',
  'roll-and-cut': 'Roll and cut',
  'final-proof': 'Final proof',
  'heat-oil': 'Heat the oil',
  cool: 'Cool',
  glaze: 'Glaze',
  pack: 'Pack',
};

export const settingsGroups: SettingsGroup[] = [
  {
    id: 'pot',
    title: 'Pot and oil',
    fields: [
      { name: 'equipment.pot.diameterMm', label: 'Pot diameter', unit: 'mm', help: 'Inside, at the oil line.' },
      { name: 'equipment.pot.oilDepthMm', label: 'Oil depth', unit: 'mm' },
      { name: 'equipment.oil.startC', label: 'Oil start temperature', temperature: true },
      { name: 'equipment.oil.floorC', label: 'Lowest oil temperature', temperature: true, help: 'Wait for the oil to come back above this between batches.' },
    ],
  },
  {
    id: 'cutting',
    title: 'Cutter and rolling',
    fields: [
      { name: 'equipment.cutter.outerMm', label: 'Cutter, outside', unit: 'mm' },
      { name: 'equipment.cutter.innerMm', label: 'Cutter hole', unit: 'mm', help: '0 for a cutter without a centre.' },
      { name: 'equipment.rolling.thicknessMm', label: 'Rolled thickness', unit: 'mm' },
      { name: 'equipment.rolling.widthMm', label: 'Bench width', unit: 'mm', help: 'How wide the dough is rolled.' },
      { name: 'equipment.rolling.gapMm', label: 'Gap between cuts', unit: 'mm' },
      { name: 'equipment.rolling.scrapPercent', label: 'Scraps per roll', unit: '%', help: 'About 30 % is usual.' },
      { name: 'equipment.rolling.rerolls', label: 'Re-rolls', whole: true, help: 'Once or twice: re-rolled dough gets tough.' },
      { name: 'equipment.rolling.doughDensityGPerCm3', label: 'Dough density', unit: 'g/cm³' },
      { name: 'equipment.rolling.measuredRingGrams', label: 'Weighed ring', unit: 'g', optional: true, help: 'Leave blank to work it out from the cutter.' },
      { name: 'equipment.rolling.measuredHoleGrams', label: 'Weighed hole', unit: 'g', optional: true, help: 'Leave blank to work it out from the cutter.' },
    ],
  },
  {
    id: 'frying',
    title: 'Frying',
    fields: [
      { name: 'equipment.frying.ringSecondsPerSide', label: 'Ring, each side', unit: 's' },
      { name: 'equipment.frying.holeSecondsPerSide', label: 'Hole, each side', unit: 's' },
      { name: 'equipment.frying.recoveryMinutes', label: 'Oil recovery between batches', unit: 'min' },
      { name: 'equipment.frying.windowMinutes', label: 'Time for frying on a bake day', unit: 'min' },
    ],
  },
  {
    id: 'space',
    title: 'Proofing, mixer and fridge',
    fields: [
      { name: 'equipment.proofing.trays', label: 'Proofing trays', whole: true },
      { name: 'equipment.proofing.ringsPerTray', label: 'Rings per tray', whole: true },
      { name: 'equipment.mixer.capacityGrams', label: 'Dough per mix', unit: 'g' },
      { name: 'equipment.mixer.mixes', label: 'Mixes there is time for', whole: true },
      { name: 'equipment.fridge.doughGrams', label: 'Dough the fridge holds', unit: 'g', help: 'During the cold retard.' },
    ],
  },
  {
    id: 'room',
    title: 'Room and spare',
    fields: [
      { name: 'roomTempC', label: 'Room temperature', temperature: true, help: 'Sets the bulk fermentation time.' },
      { name: 'spare.percent', label: 'Spare on top of the orders', unit: '%' },
    ],
  },
  {
    id: 'schedule',
    title: 'Schedule',
    intro: 'Minutes for each step; frying time is worked out from the fry batches.',
    fields: [
      ...scheduleStepIds.map(
        (step): SettingsField => ({ name: `schedule.durationsMinutes.${step}`, label: stepLabels[step], unit: 'min', whole: true }),
      ),
      { name: 'schedule.bulkReferenceTempC', label: 'Room temperature for that bulk time', temperature: true },
      {
        name: 'schedule.cutoffMarginMinutes',
        label: 'Pre-orders close before the first step',
        unit: 'min',
        whole: true,
      },
    ],
  },
];

export const settingsFieldNames: SettingsPath[] = settingsGroups.flatMap((group) => group.fields.map((field) => field.name));

/** The stored settings as the form's starting values (the save date is not part of the form). */
export function toSettingsValues(settings: ProductionSettingsInput & { updatedAt?: string | null }): ProductionSettingsInput {
  const { updatedAt: _ignored, ...stored } = settings;
  const values = structuredClone(stored);
  // Blank optional fields are held as undefined; give them their keys so an untouched form compares equal.
  const { rolling } = values.equipment;
  values.equipment.rolling = { ...rolling, measuredRingGrams: rolling.measuredRingGrams, measuredHoleGrams: rolling.measuredHoleGrams };
  values.glazes = values.glazes.map((glaze) => ({ ...glaze, extraPercent: glaze.extraPercent, allergens: glaze.allergens }));
  values.prices = { ...values.prices, oilBakesPerFill: values.prices.oilBakesPerFill };
  return values;
}

/**
 * A field path as the API or the bake maths writes it, in the form's dotted
 * shape: `glazes[1].parts[0].parts` → `glazes.1.parts.0.parts`,
 * `prices.centsPerKg["Icing sugar"]` → `prices.centsPerKg.Icing sugar`.
 */
export function dottedPath(path: string): string {
  return path
    .replace(/\["((?:[^"\\]|\\.)*)"\]/g, (_match, key: string) => `.${key.replace(/\\(.)/g, '$1')}`)
    .replace(/\[(\d+)\]/g, '.$1');
}

/** A price's name the form can hold an error for: no dots, brackets, quotes or commas to split it. */
const plainKey = /^[^.,[\]'"]+$/;

/** Every field these values show, glaze and price rows included: where an error from the API can go. */
export function formFieldNames(values: ProductionSettingsInput): SettingsPath[] {
  const glazeFields = values.glazes.flatMap((glaze, i): SettingsPath[] => [
    `glazes.${i}.id`,
    `glazes.${i}.name`,
    `glazes.${i}.gramsPerRing`,
    `glazes.${i}.gramsPerHole`,
    `glazes.${i}.extraPercent`,
    `glazes.${i}.allergens`,
    `glazes.${i}.parts`,
    ...glaze.parts.flatMap((_part, j): SettingsPath[] => [`glazes.${i}.parts.${j}.name`, `glazes.${i}.parts.${j}.parts`]),
  ]);
  const priceFields = Object.keys(values.prices.centsPerKg)
    .filter((name) => plainKey.test(name))
    .map((name): SettingsPath => `prices.centsPerKg.${name}`);
  return [...settingsFieldNames, 'glazes', ...glazeFields, 'prices.fryingOilCentsPerKg', 'prices.oilBakesPerFill', ...priceFields];
}

/**
 * Puts the API's field errors beside the inputs they name, whichever way
 * the path is written; returns the messages no input took.
 */
export function placeServerErrors(
  error: unknown,
  values: ProductionSettingsInput,
  setError: (name: SettingsPath, error: { type: string; message: string }) => void,
): string[] {
  const known = new Set<string>(formFieldNames(values));
  const keys = isApiError(error) ? Object.keys(error.fieldErrors).filter((key) => known.has(dottedPath(key))) : [];
  return putFieldErrors(error, (key, fieldError) => setError(dottedPath(key) as SettingsPath, fieldError), keys);
}

export const limitNames: Record<CapacityLimit, string> = {
  fry: 'Frying time',
  'proofing-trays': 'Proofing trays',
  mixer: 'Mixer',
  fridge: 'Fridge space',
};
