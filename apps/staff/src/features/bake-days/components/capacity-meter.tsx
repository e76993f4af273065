/** "38 / 120" left, with a bar of what is already spoken for. */
export function CapacityMeter({ left, capacity, unit }: { left: number; capacity: number; unit: string }) {
  const taken = capacity > 0 ? Math.min(1, Math.max(0, (capacity - left) / capacity)) : 0;
  return (
    <div className="min-w-16">
      <p className="font-semibold whitespace-nowrap tabular-nums">
        {left}
        <span className="text-muted"> / {capacity}</span>
        <span className="sr-only"> {unit} left</span>
      </p>
      <div className="mt-1 h-2 overflow-hidden rounded-full bg-crumb" aria-hidden="true">
        <div
          className={`h-full rounded-full ${left <= 0 ? 'bg-brick-700' : 'bg-plum-600'}`}
          style={{ width: `${taken * 100}%` }}
        />
      </div>
    </div>
  );
}
