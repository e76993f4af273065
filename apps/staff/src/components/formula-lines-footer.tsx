import { formatPercent } from '../lib/units';

/** Under a formula's lines: the button for another line, and the flour lines' total (they must make 100 %). */
export function FormulaLinesFooter({ flour, canAdd, onAdd }: { flour: number; canAdd: boolean; onAdd: () => void }) {
  const right = Math.abs(flour - 100) < 1e-9;
  return (
    <div className="flex flex-wrap items-center justify-between gap-3">
      <button type="button" className="btn btn-quiet btn-small" onClick={onAdd} disabled={!canAdd}>
        Add an ingredient
      </button>
      <p className={`font-semibold ${right ? 'text-sage-700' : 'text-brick-700'}`}>
        Flour lines: {formatPercent(flour, 2)}
        {right ? '' : ' (they must add up to 100 %)'}
      </p>
    </div>
  );
}
