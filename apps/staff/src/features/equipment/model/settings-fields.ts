/**
 * The equipment form's fields, in the order the owner meets them, and how
 * the stored settings become the form's values. Temperatures stay in °C in
 * the form's values; only their inputs show the chosen scale.
 */
import type { Path } from 'react-hook-form';
import { scheduleStepIds, type ProductionSettingsInput, type ProductionSettingsView } from '@fryline/schemas';
import { DEFAULT_BENCH_LENGTH_MM, DEFAULT_BURNER, DEFAULT_PLAN_SETTINGS, DEFAULT_POT_BODY, DEFAULT_RATES, DEFAULT_TRAY, type CapacityLimit } from '@fryline/production';
import { isApiError, putFieldErrors } from '@fryline/ui/api-client';
import { doughFieldNames, doughFormPath } from './doughs';

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
  /** A temperature rise (mixer friction): shown in the chosen scale without the 32° offset. */
  temperatureDifference?: boolean;
  /** A choice from a list instead of a number. */
  choices?: ReadonlyArray<{ value: string; label: string }>;
}

export interface SettingsGroup {
  id: string;
  title: string;
  intro?: string;
  fields: SettingsField[];
}

const stepLabels: Record<(typeof scheduleStepIds)[number], string> = {
  'build-starter': 'Build the starter (not used: the starter\'s peak sets it)',
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
      { name: 'equipment.pot.oilDepthMm', label: 'Oil depth', unit: 'mm', help: 'Measured cold, when poured.' },
      { name: 'equipment.pot.heightMm', label: 'Pot height', unit: 'mm', help: 'Inside; hot oil with a batch in must stay well below the rim.' },
      { name: 'equipment.pot.massGrams', label: 'Empty pot', unit: 'g', help: 'A heavy pot holds heat and the oil recovers faster.' },
      {
        name: 'equipment.pot.material',
        label: 'Pot metal',
        choices: [
          { value: 'cast-iron', label: 'Cast iron (enamelled or bare)' },
          { value: 'carbon-steel', label: 'Carbon steel' },
          { value: 'stainless-steel', label: 'Stainless steel' },
          { value: 'aluminium', label: 'Aluminium' },
          { value: 'copper', label: 'Copper' },
        ],
      },
      { name: 'equipment.burner.watts', label: 'Burner power', unit: 'W', help: 'A home gas burner gives roughly 1,500–3,000 W.' },
      { name: 'equipment.burner.efficiencyPercent', label: 'Share reaching the oil', unit: '%', optional: true, help: 'About 40 % for gas; more for induction.' },
      { name: 'equipment.oil.startC', label: 'Oil start temperature', temperature: true, help: 'The reading to wait for before each batch.' },
      { name: 'equipment.oil.floorC', label: 'Lowest oil temperature', temperature: true, help: 'Many bakers keep the oil between 360 °F and 375 °F.' },
      { name: 'equipment.oil.minDepthMm', label: 'Top up below', unit: 'mm', optional: true, help: 'Cold depth at which to add oil. Blank: 40 mm.' },
      { name: 'equipment.oil.minFreeboardMm', label: 'Room above the hot oil', unit: 'mm', optional: true, help: 'Blank: 75 mm.' },
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
      { name: 'equipment.rolling.benchLengthMm', label: 'Bench length', unit: 'mm', help: 'The longest sheet you roll in one go.' },
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
      { name: 'equipment.frying.recoveryMinutes', label: 'Least time between batches', unit: 'min', help: 'Lift out, drain, load; longer when the oil needs it.' },
      { name: 'equipment.frying.absorbedFatPercent', label: 'Fat taken up', unit: '% of fried weight', optional: true, help: '15–25 % is usual. Blank: 22 %.' },
      { name: 'equipment.frying.windowMinutes', label: 'Time for frying on a bake day', unit: 'min' },
    ],
  },
  {
    id: 'space',
    title: 'Proofing, mixer and fridge',
    fields: [
      { name: 'equipment.proofing.trays', label: 'Proofing trays', whole: true },
      { name: 'equipment.proofing.ringsPerTray', label: 'Most rings on a tray', whole: true },
      { name: 'equipment.proofing.trayWidthMm', label: 'Tray width', unit: 'mm' },
      { name: 'equipment.proofing.trayLengthMm', label: 'Tray length', unit: 'mm' },
      { name: 'equipment.proofing.trayGapMm', label: 'Room between pieces on a tray', unit: 'mm', optional: true },
      { name: 'equipment.mixer.capacityGrams', label: 'Bowl capacity', unit: 'g', help: 'Dough one mix can hold; more dough is mixed in turns.' },
      { name: 'equipment.mixer.mixes', label: 'Mixes there is time for', whole: true },
      { name: 'equipment.fridge.doughGrams', label: 'Dough the fridge holds', unit: 'g', help: 'During the cold retard.' },
    ],
  },
  {
    id: 'room',
    title: 'Room and spare',
    fields: [
      { name: 'roomTempC', label: 'Room temperature', temperature: true, help: 'The dough drifts towards it during bulk fermentation.' },
      { name: 'spare.percent', label: 'Spare on top of the orders', unit: '%' },
    ],
  },
  {
    id: 'dough-temperature',
    title: 'Dough temperature',
    intro: 'The sheet works out how warm the liquid must be so the dough leaves the mixer at the temperature you aim for; fermentation times follow that temperature.',
    fields: [
      { name: 'dough.temperature.targetC', label: 'Desired dough temperature', temperature: true, help: '78–82 °F is usual for yeast-raised doughnuts.' },
      { name: 'dough.temperature.frictionC', label: 'Mixer friction', temperatureDifference: true, help: 'The warmth the mixer adds: about 20 °F for a stand mixer, 5 °F by hand.' },
      { name: 'dough.temperature.flourC', label: 'Flour temperature', temperature: true, optional: true, help: 'Blank: the room’s.' },
      { name: 'dough.temperature.starterC', label: 'Starter temperature', temperature: true, optional: true, help: 'Blank: the room’s.' },
      { name: 'dough.temperature.rouxC', label: 'Roux temperature', temperature: true, optional: true, help: 'Blank: cooled to the room’s.' },
      { name: 'dough.temperature.proofC', label: 'Proofing temperature', temperature: true, optional: true, help: 'A proofing box; blank: the room’s.' },
      {
        name: 'dough.eggClass',
        label: 'Eggs you buy',
        choices: [
          { value: 'medium', label: 'Medium' },
          { value: 'large', label: 'Large' },
          { value: 'extra-large', label: 'Extra large' },
          { value: 'jumbo', label: 'Jumbo' },
        ],
      },
    ],
  },
  {
    id: 'rates',
    title: 'Your pace',
    intro: 'How long the work takes you; rolling, glazing and packing grow with the quantity.',
    fields: [
      { name: 'schedule.rates.rollMinutesPerSheet', label: 'Roll and cut one sheet', unit: 'min' },
      { name: 'schedule.rates.rerollRestMinutes', label: 'Rest the scraps before re-rolling', unit: 'min' },
      { name: 'schedule.rates.glazeSecondsPerPiece', label: 'Glaze one piece', unit: 's' },
      { name: 'schedule.rates.packSecondsPerBox', label: 'Pack one box', unit: 's' },
    ],
  },
  {
    id: 'schedule',
    title: 'Schedule',
    intro: 'Minutes for each step. Bulk fermentation and the final proof are at the temperature below and follow the dough’s; mixing and shaping are per mix; the cold retard is the least time in the fridge; rolling, glazing and packing are the set-up on top of your pace. Frying is worked out batch by batch.',
    fields: [
      ...scheduleStepIds.map(
        (step): SettingsField => ({ name: `schedule.durationsMinutes.${step}`, label: stepLabels[step], unit: 'min', whole: true }),
      ),
      { name: 'schedule.bulkReferenceTempC', label: 'Dough temperature for those times', temperature: true },
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
export function toSettingsValues(settings: (ProductionSettingsInput | ProductionSettingsView) & { updatedAt?: string | null }): ProductionSettingsInput {
  const { updatedAt: _ignored, ...stored } = settings;
  const values = structuredClone(stored) as ProductionSettingsInput;
  // Settings saved before these fields existed get the values the plan would use.
  const eq = values.equipment;
  eq.pot = { ...DEFAULT_POT_BODY, ...eq.pot };
  eq.burner = { ...DEFAULT_BURNER, ...eq.burner };
  eq.oil = { ...eq.oil, minDepthMm: eq.oil.minDepthMm, minFreeboardMm: eq.oil.minFreeboardMm };
  eq.rolling = { ...eq.rolling, benchLengthMm: eq.rolling.benchLengthMm ?? DEFAULT_BENCH_LENGTH_MM };
  eq.proofing = { trayWidthMm: DEFAULT_TRAY.trayWidthMm, trayLengthMm: DEFAULT_TRAY.trayLengthMm, ...eq.proofing, trayGapMm: eq.proofing.trayGapMm };
  eq.frying = { ...eq.frying, absorbedFatPercent: eq.frying.absorbedFatPercent };
  values.schedule = { ...values.schedule, rates: { ...DEFAULT_RATES, ...values.schedule.rates } };
  values.dough ??= { temperature: structuredClone(DEFAULT_PLAN_SETTINGS.doughTemperature!) as NonNullable<ProductionSettingsInput['dough']>['temperature'], variations: [], eggClass: 'large' };
  {
    const t = values.dough.temperature;
    values.dough = { ...values.dough, temperature: { ...t, flourC: t.flourC, starterC: t.starterC, rouxC: t.rouxC, proofC: t.proofC } };
  }
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
  return [...settingsFieldNames, 'glazes', ...glazeFields, 'prices.fryingOilCentsPerKg', 'prices.oilBakesPerFill', ...priceFields, 'dough.variations', ...doughFieldNames(values)];
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
  const formPath = (key: string) => doughFormPath(dottedPath(key));
  const keys = isApiError(error) ? Object.keys(error.fieldErrors).filter((key) => known.has(formPath(key))) : [];
  return putFieldErrors(error, (key, fieldError) => setError(formPath(key) as SettingsPath, fieldError), keys);
}

export const limitNames: Record<CapacityLimit, string> = {
  fry: 'Frying time',
  'proofing-trays': 'Proofing trays',
  mixer: 'Mixer',
  fridge: 'Fridge space',
};
