import { useState } from 'react';
import { useCurrency, useMoney } from '@fryline/ui';
import { currencySymbol, parseMoney, type PaymentMethod, type Surplus } from '@fryline/schemas';
import { plural } from '@fryline/ui/format';
import { useWalkUpSale } from '../api/counter-mutations';
import { useOnline } from './use-online';

/** Sell what is left to someone without a pre-order: items, cash or card (on the card reader), and the amount taken. */
export function WalkUpForm({ bakeDayId, surplus }: { bakeDayId: string; surplus: Surplus }) {
  const money = useMoney();
  const currency = useCurrency();
  const [counts, setCounts] = useState<Record<string, number>>({});
  const [method, setMethod] = useState<PaymentMethod>('cash');
  const [amount, setAmount] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const online = useOnline();
  const { sell } = useWalkUpSale();

  const chosen = surplus.items.filter((i) => (counts[i.menuItemId] ?? 0) > 0);
  const rings = chosen.filter((i) => i.kind === 'ring').reduce((n, i) => n + counts[i.menuItemId]!, 0);
  const holes = chosen.filter((i) => i.kind === 'hole').reduce((n, i) => n + counts[i.menuItemId]!, 0);
  const step = (id: string, by: number, max: number) => setCounts((c) => ({ ...c, [id]: Math.max(0, Math.min(max, (c[id] ?? 0) + by)) }));

  return (
    <form
      className="flex flex-col gap-4"
      aria-label="Walk-up sale"
      onSubmit={(e) => {
        e.preventDefault();
        setMessage(null);
        const typed = parseMoney(amount, currency);
        if (chosen.length === 0) return setProblem('Add at least one doughnut.');
        if (!typed.ok) return setProblem(typed.message);
        const cents = typed.cents;
        setProblem(null);
        const what = `${money(cents)} ${method}`;
        sell(
          { bakeDayId, method, amountCents: cents, items: chosen.map((i) => ({ menuItemId: i.menuItemId, name: i.name, quantity: counts[i.menuItemId]! })) },
          { onSuccess: () => setMessage(`Sale recorded: ${what}.`), onError: () => setMessage(null) },
        );
        setMessage(online ? `Recording the sale (${what})…` : `Sale kept on this phone (${what}); it is sent when the connection is back.`);
        setCounts({});
        setAmount('');
      }}
    >
      <p className="text-muted">Fryline records the sale; a card is charged on your own card reader, not here.</p>
      <ul className="flex flex-col gap-2">
        {surplus.items.map((item) => {
          const n = counts[item.menuItemId] ?? 0;
          return (
            <li key={item.menuItemId} className="card flex items-center gap-3 p-3">
              <div className="min-w-0 flex-1">
                <p className="font-extrabold leading-tight">{item.name}</p>
                <p className="text-sm text-muted">{item.left === 0 ? 'None left' : `${item.left} left`}</p>
              </div>
              <button type="button" className="btn btn-quiet h-12 w-12 p-0 text-2xl" aria-label={`One less ${item.name}`} disabled={n === 0} onClick={() => step(item.menuItemId, -1, item.left)}>
                −
              </button>
              <output className="w-8 text-center text-xl font-extrabold" aria-label={`${item.name} in this sale`}>
                {n}
              </output>
              <button type="button" className="btn btn-quiet h-12 w-12 p-0 text-2xl" aria-label={`One more ${item.name}`} disabled={n >= item.left} onClick={() => step(item.menuItemId, 1, item.left)}>
                +
              </button>
            </li>
          );
        })}
      </ul>
      <fieldset className="flex flex-col gap-2">
        <legend className="font-extrabold">Paid by</legend>
        <div className="grid grid-cols-2 gap-2">
          {(['cash', 'card'] as const).map((m) => (
            <label key={m} className={`btn min-h-14 border-2 ${method === m ? 'btn-primary' : 'btn-quiet'}`}>
              <input type="radio" name="method" value={m} checked={method === m} onChange={() => setMethod(m)} className="sr-only" />
              {m === 'cash' ? 'Cash' : 'Card'}
            </label>
          ))}
        </div>
      </fieldset>
      <label className="flex flex-col gap-1">
        <span className="font-extrabold">Amount taken ({currencySymbol(currency)})</span>
        <input className="field-input min-h-14 text-lg" inputMode="decimal" autoComplete="off" value={amount} onChange={(e) => setAmount(e.target.value)} placeholder="0.00" />
      </label>
      {problem && (
        <p role="alert" className="field-error">
          {problem}
        </p>
      )}
      <button type="submit" className="btn btn-primary min-h-14 text-lg">
        Record sale{rings + holes > 0 ? ` (${[rings ? plural(rings, 'ring') : '', holes ? plural(holes, 'hole') : ''].filter(Boolean).join(', ')})` : ''}
      </button>
      {message && (
        <p role="status" className="notice notice-ok">
          {message}
        </p>
      )}
    </form>
  );
}
