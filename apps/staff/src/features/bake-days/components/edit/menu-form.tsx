import { useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import { boxLabel, centsToInput, currencySymbol, parseMoney, type BakeDayEditView, type BoxSize } from '@fryline/schemas';
import { FieldShell, LoadingState, useCurrency } from '@fryline/ui';
import { menuItemQueries } from '../../api/menu-item-queries';
import { SectionForm, useServerReset } from './section-form';


/** What this day sells and the box prices. Orders already paid keep what they paid. */
export function MenuForm({ day }: { day: BakeDayEditView }) {
  const currency = useCurrency();
  const sign = currencySymbol(currency);
  const menu = useQuery(menuItemQueries.all());
  const [chosen, setChosen] = useState(() => new Set(day.menuItemIds));
  const pricesOf = () => Object.fromEntries(day.boxes.map((b) => [b.size, centsToInput(b.priceCents)])) as Partial<Record<BoxSize, string>>;
  const [prices, setPrices] = useState(pricesOf);
  useServerReset([day.menuItemIds, day.boxes], () => {
    setChosen(new Set(day.menuItemIds));
    setPrices(pricesOf());
  });

  const build = () => {
    if (chosen.size === 0) return 'Keep at least one item on the menu.';
    const boxes = [];
    for (const box of day.boxes) {
      const price = parseMoney(prices[box.size] ?? '', currency);
      if (!price.ok) return `${boxLabel(box.size)}: ${price.message}.`;
      boxes.push({ size: box.size, pieces: box.pieces, priceCents: price.cents });
    }
    return { menuItemIds: [...chosen], boxes };
  };

  return (
    <SectionForm bakeDayId={day.id} title="Menu and box prices" intro="New prices apply to new orders; paid orders keep their price." build={build}>
      {menu.isPending ? (
        <LoadingState label="Loading the menu…" />
      ) : (
        <fieldset>
          <legend className="field-label">On the menu this day</legend>
          <ul className="grid gap-1 sm:grid-cols-2">
            {(menu.data ?? [])
              .filter((m) => m.active || chosen.has(m.id))
              .map((m) => (
                <li key={m.id}>
                  <label className="flex items-center gap-2">
                    <input
                      type="checkbox"
                      checked={chosen.has(m.id)}
                      onChange={(e) =>
                        setChosen((all) => {
                          const next = new Set(all);
                          if (e.target.checked) next.add(m.id);
                          else next.delete(m.id);
                          return next;
                        })
                      }
                    />
                    {m.name} <span className="text-sm text-muted">({m.kind === 'ring' ? 'ring' : 'hole'})</span>
                  </label>
                </li>
              ))}
          </ul>
        </fieldset>
      )}
      <div className="grid gap-3 sm:grid-cols-3">
        {day.boxes.map((box) => (
          <FieldShell key={box.size} id={`edit-price-${box.size}`} label={`${boxLabel(box.size)} (${box.pieces})`} unit={sign}>
            <input
              id={`edit-price-${box.size}`}
              inputMode="decimal"
              className="field-input"
              value={prices[box.size] ?? ''}
              onChange={(e) => setPrices((all) => ({ ...all, [box.size]: e.target.value }))}
            />
          </FieldShell>
        ))}
      </div>
    </SectionForm>
  );
}
