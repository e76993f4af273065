import { useEffect, useState, type ReactNode } from 'react';
import { centsPerKgFromText, priceText, type PriceUnit } from '../model/prices';
import { FieldShell, fieldAria, useCurrencySign } from '@fryline/ui';

/**
 * A price typed in the shop's currency a kg or a lb while the form keeps whole cents a
 * kg. The typed text stays as typed, and is shown afresh only when the
 * price changes from outside (a reset, the other weight unit).
 */
export function PriceInput({
  id,
  label,
  unit,
  cents,
  onCents,
  help,
  error,
}: {
  id: string;
  label: ReactNode;
  unit: PriceUnit;
  /** undefined: no price yet; NaN: text that is not a price. */
  cents: number | undefined;
  onCents: (cents: number | undefined) => void;
  help?: ReactNode;
  error?: string;
}) {
  const sign = useCurrencySign();
  const [text, setText] = useState(() => priceText(cents, unit));
  const read = (typed: string) => (typed.trim() === '' ? undefined : centsPerKgFromText(typed, unit));

  useEffect(() => {
    const typed = read(text);
    const same = typed === undefined || cents === undefined ? typed === cents : Object.is(typed, cents);
    if (!same) setText(priceText(cents, unit));
    // Only an outside change rewrites what was typed.
  }, [cents, unit]);

  return (
    <FieldShell id={id} label={label} help={help} error={error}>
      <div className="relative">
        <span aria-hidden="true" className="pointer-events-none absolute top-1/2 left-3 -translate-y-1/2 font-semibold text-muted">
          {sign}
        </span>
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          className="field-input pl-7 tabular-nums"
          value={text}
          {...fieldAria(id, help, error)}
          onChange={(event) => {
            setText(event.target.value);
            onCents(read(event.target.value));
          }}
        />
      </div>
    </FieldShell>
  );
}
