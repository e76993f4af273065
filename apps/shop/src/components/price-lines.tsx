import type { OrderBill } from '@fryline/schemas';
import { useMoney } from '@fryline/ui';

interface PriceLinesProps {
  bill: OrderBill;
  refundedCents?: number;
  /** The total's words: "Total" on a paid order, "To pay" before payment. */
  totalLabel?: string;
  /** The order's own currency; the shop's when not given (a bill being built). */
  currency?: string;
}

/** An order's bill, line by line (from orderBill, so the lines add up to the total). */
export function PriceLines({ bill, refundedCents = 0, totalLabel = 'Total', currency }: PriceLinesProps) {
  const money = useMoney(currency);
  return (
    <dl className="grid grid-cols-[1fr_auto] gap-y-1 [&>div>dd]:pl-4" data-testid="price-lines">
      {bill.lines.map((line, index) => (
        <div key={index} className="contents" data-price-line={line.kind} data-cents={line.cents}>
          <dt className={line.kind === 'box' ? 'font-semibold' : 'pl-4 text-muted'}>{line.label}</dt>
          <dd className={`text-right tabular-nums ${line.kind === 'box' ? 'font-semibold' : 'text-muted'}`}>{money(line.cents)}</dd>
        </div>
      ))}
      <div className="contents" data-price-total={bill.totalCents}>
        <dt className="mt-1 border-t border-line pt-1 text-lg font-extrabold">{totalLabel}</dt>
        <dd className="mt-1 border-t border-line pt-1 text-right text-lg font-extrabold tabular-nums">{money(bill.totalCents)}</dd>
      </div>
      {bill.includedTaxCents !== null && (
        <div className="contents">
          <dt className="text-sm text-muted">Tax included in the prices</dt>
          <dd className="text-right text-sm text-muted tabular-nums">{money(bill.includedTaxCents)}</dd>
        </div>
      )}
      {refundedCents > 0 && (
        <div className="contents">
          <dt className="text-sage-700">Refunded to your card</dt>
          <dd className="text-right text-sage-700 tabular-nums">−{money(refundedCents)}</dd>
        </div>
      )}
    </dl>
  );
}
