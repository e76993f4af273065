import { listWords } from '@fryline/ui/format';
import { baseAllergens } from '../config/site';

/** The standing allergen caution: on the front page, and again before paying. */
export function AllergenCaution({ className = '' }: { className?: string }) {
  return (
    <div className={`notice notice-warn ${className}`}>
      <p className="font-extrabold">Allergens: please read before you order</p>
      <p>
        Every doughnut we make contains {listWords(baseAllergens)}. Some glazes and toppings add more; each item lists
        its own allergens. Everything is made in one home-scale kitchen and fried in the same pot of oil, so traces
        can pass from one item to another. If an allergy is serious for you, please do not rely on these labels alone.
      </p>
    </div>
  );
}
