/**
 * The equipment form's fields, in the order the owner meets them, and how
 * the stored settings become the form's values. Temperatures stay in °C in
 * the form's values; only their inputs show the chosen scale.
 */
import type { Path } from 'react-hook-form';
import { scheduleStepIds, type ProductionSettingsInput } from '@fryline/schemas';
import type { CapacityLimit } from '@fryline/production';

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
  return values;
}

export const limitNames: Record<CapacityLimit, string> = {
  fry: 'Frying time',
  'proofing-trays': 'Proofing trays',
  mixer: 'Mixer',
  fridge: 'Fridge space',
};
