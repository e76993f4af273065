/**
 * Planning warnings as data: a stable code the screens and tests can key on,
 * and a sentence the baker reads on the sheet. The common bake raises none.
 */
export const WARNING_CODES = [
  'cutter_wider_than_sheet',
  'egg_rounding_shift',
  'ambiguous_local_time',
  'nonexistent_local_time',
  'bowl_too_small',
  'formula_outside_usual_range',
  'liquid_temperature_out_of_range',
  'room_too_cold',
  'room_too_warm',
  'cutoff_passed',
  'schedule_cannot_be_met',
  'oil_outside_usual_range',
  'oil_near_smoke_point',
  'one_piece_cools_oil',
  'freeboard_too_small',
  'oil_too_shallow',
  'over_capacity',
  'fry_longer_than_window',
  'sheet_fits_fewer',
  'fridge_too_small',
  'missing_prices',
] as const;
export type WarningCode = (typeof WARNING_CODES)[number];

export interface PlanWarning {
  code: WarningCode;
  message: string;
}

export function warning(code: WarningCode, message: string): PlanWarning {
  return { code, message };
}
