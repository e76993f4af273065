import { Caution } from '@fryline/ui';
import { listWords } from '@fryline/ui/format';
import { baseAllergens } from '../config/site';

/** The standing allergen caution: on the front page, and again before paying. */
export function AllergenCaution({ className = '' }: { className?: string }) {
  return (
    <Caution title="Allergens: please read before you order" className={className}>
      <p>
        Every doughnut we make contains {listWords(baseAllergens)}. Some glazes and toppings add more; each item lists
        its own allergens. Everything is made in one home-scale kitchen and fried in the same pot of oil, so traces
        can pass from one item to another. If an allergy is serious for you, please do not rely on these labels alone.
      </p>
    </Caution>
  );
}
