import { baseAllergens } from '../config/site';

const base = new Set<string>(baseAllergens);

/**
 * The allergens an item or an order contains, as one line of text. Allergens
 * beyond the wheat, milk and eggs in every doughnut stand out.
 */
export function AllergenList({ allergens, label = 'Contains' }: { allergens: readonly string[]; label?: string }) {
  if (allergens.length === 0) return null;
  return (
    <p className="text-sm">
      <span className="font-extrabold text-sugar-700">{label}: </span>
      {allergens.map((name, index) => (
        <span key={name}>
          {index > 0 && ', '}
          {base.has(name) ? (
            name
          ) : (
            <strong className="rounded bg-honey-100 px-1 font-extrabold text-honey-800">{name}</strong>
          )}
        </span>
      ))}
    </p>
  );
}

/** Every allergen in a list of items, each once, in the order first seen. */
export function allergensOf(items: ReadonlyArray<{ allergens: readonly string[] }>): string[] {
  return [...new Set(items.flatMap((item) => item.allergens))];
}
