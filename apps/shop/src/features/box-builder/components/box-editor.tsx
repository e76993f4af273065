import { useId, useState, type Dispatch } from 'react';
import type { BakeDayView } from '@fryline/schemas';
import { boxOf, filledCount, itemsForBox, type DraftAction, type DraftBox } from '../model/draft';
import { MenuItemInfo } from '../../../components/menu-item-info';
import { MenuPhoto, useMoney } from '@fryline/ui';
import { QuantityStepper } from './quantity-stepper';

interface BoxEditorProps {
  day: BakeDayView;
  box: DraftBox;
  title: string;
  priceCents: number;
  dispatch: Dispatch<DraftAction>;
}

/** One box: a counter of how full it is, a stepper per menu item, and a "fill the rest" helper. */
export function BoxEditor({ day, box, title, priceCents, dispatch }: BoxEditorProps) {
  const money = useMoney();
  const pieces = boxOf(day, box.size)?.pieces ?? 0;
  const items = itemsForBox(day, box.size);
  const filled = filledCount(box);
  const left = pieces - filled;
  const [fillWith, setFillWith] = useState(items[0]?.id ?? '');
  const fillId = useId();

  return (
    <section className="card" aria-labelledby={`box-${box.key}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id={`box-${box.key}`} tabIndex={-1} className="text-xl">
          {title}
        </h3>
        <div className="flex items-center gap-3">
          <span className="font-extrabold">{money(priceCents)}</span>
          <button
            type="button"
            className="btn btn-quiet btn-small"
            onClick={() => dispatch({ type: 'removeBox', key: box.key })}
          >
            Remove<span className="sr-only"> {title}</span>
          </button>
        </div>
      </div>

      <div className="mt-3">
        <p aria-live="polite" className={`font-extrabold ${left === 0 ? 'text-sage-700' : ''}`}>
          {filled} of {pieces}
          <span className="font-semibold text-muted">{left === 0 ? ' · full' : ` · ${left} to choose`}</span>
        </p>
        <div className="mt-1 h-2 overflow-hidden rounded-full bg-crumb" aria-hidden="true">
          <div
            className={`h-full rounded-full ${left === 0 ? 'bg-sage-700' : 'bg-sugar-400'}`}
            style={{ width: `${pieces ? (filled / pieces) * 100 : 0}%` }}
          />
        </div>
      </div>

      <ul className="mt-2">
        {items.map((item) => (
          <li key={item.id} className="flex items-start justify-between gap-3 border-t border-line py-3 first:border-t-0">
            <div className="flex min-w-0 items-start gap-3">
              {item.photo && (
                <MenuPhoto photo={item.photo} alt={`${item.name}, photographed`} sizes="80px" className="aspect-square w-16 shrink-0 rounded-xl sm:w-20" />
              )}
              <MenuItemInfo item={item} />
            </div>
            <QuantityStepper
              itemName={item.name}
              value={box.items[item.id] ?? 0}
              canAdd={left > 0}
              onChange={(quantity) => dispatch({ type: 'setQuantity', key: box.key, itemId: item.id, quantity })}
            />
          </li>
        ))}
      </ul>

      {left > 0 && items.length > 0 && (
        <div className="mt-2 flex flex-wrap items-end gap-2 rounded-2xl bg-crumb p-3">
          <div className="min-w-0 flex-1">
            <label htmlFor={fillId} className="field-label text-sm">
              Fill the other {left} with
            </label>
            <select id={fillId} className="field-input" value={fillWith} onChange={(e) => setFillWith(e.target.value)}>
              {items.map((item) => (
                <option key={item.id} value={item.id}>
                  {item.name}
                </option>
              ))}
            </select>
          </div>
          <button
            type="button"
            className="btn btn-quiet bg-white"
            onClick={() => dispatch({ type: 'fillRest', key: box.key, itemId: fillWith })}
          >
            Fill
          </button>
        </div>
      )}
    </section>
  );
}
