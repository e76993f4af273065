/**
 * The usual cautions printed with every production sheet. They advise; they
 * never claim that a bake meets any code.
 */
import { tempInBothScales } from './units.js';

export function hotOilCautions(oilStartC: number, oilFloorC: number): string[] {
  return [
    'Hot oil: stay with the pot the whole time it is on the heat, and keep children and pets away from the stove.',
    'Keep a lid or a metal tray at hand. If the oil catches fire, turn off the heat and slide the lid over the pot; never put water on burning oil. If the fire spreads, get out and call the fire service.',
    `Watch the thermometer: keep the oil between ${tempInBothScales(oilFloorC)} and ${tempInBothScales(oilStartC)}; if it smokes, turn off the heat.`,
    'Lower pieces in gently, away from you, and let the oil cool completely before moving or straining it.',
  ];
}

/** Distinct allergens, first spelling kept, in the order met. */
export function distinctAllergens(lists: Array<readonly string[] | undefined>): string[] {
  const seen = new Map<string, string>();
  for (const list of lists) {
    for (const a of list ?? []) {
      const key = a.trim().toLowerCase();
      if (key !== '' && !seen.has(key)) seen.set(key, a.trim());
    }
  }
  return [...seen.values()];
}

export function allergenCaution(allergens: string[]): string {
  return allergens.length > 0
    ? `Allergens in tonight's bake: ${allergens.join(', ')}. Show them at the stand and on every box, and keep tools for different items apart.`
    : 'No allergens were listed for tonight\'s bake: check the menu items before selling.';
}

export const HOME_FOOD_RULES_CAUTION =
  'Rules for selling home-made food (which foods, permits, sales limits, where you may sell and what labels say) differ by state and town: check with your local health authority. This plan does not make a bake compliant.';
