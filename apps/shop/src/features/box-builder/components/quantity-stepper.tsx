interface QuantityStepperProps {
  itemName: string;
  value: number;
  canAdd: boolean;
  onChange: (quantity: number) => void;
}

/** − n + for one menu item in one box. */
export function QuantityStepper({ itemName, value, canAdd, onChange }: QuantityStepperProps) {
  const button =
    'flex size-11 items-center justify-center rounded-full border-2 border-plum-300 bg-white text-xl font-extrabold text-plum-800 enabled:hover:bg-plum-50 disabled:opacity-40';
  return (
    <div role="group" aria-label={`How many ${itemName}`} className="flex shrink-0 items-center gap-1">
      <button
        type="button"
        className={button}
        aria-label={`One fewer ${itemName}`}
        disabled={value === 0}
        onClick={() => onChange(value - 1)}
      >
        −
      </button>
      <span className="w-8 text-center text-lg font-extrabold tabular-nums">{value}</span>
      <button
        type="button"
        className={button}
        aria-label={`One more ${itemName}`}
        disabled={!canAdd}
        onClick={() => onChange(value + 1)}
      >
        +
      </button>
    </div>
  );
}
