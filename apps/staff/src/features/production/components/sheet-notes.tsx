import { Caution } from '@fryline/ui';

/** Planning notes worked out with the sheet: ranges, timing, capacity. */
export function SheetWarnings({ warnings }: { warnings: readonly string[] }) {
  if (warnings.length === 0) return null;
  return (
    <section aria-labelledby="warnings-heading" className="notice notice-warn sheet-section lg:col-span-2">
      <h2 id="warnings-heading" className="text-lg">
        Check before you start
      </h2>
      <ul className="mt-1 list-disc space-y-1 pl-5">
        {warnings.map((warning) => (
          <li key={warning}>{warning}</li>
        ))}
      </ul>
    </section>
  );
}

/** The standing cautions: hot oil, tonight's allergens, the rules for selling home-made food. */
export function SheetCautions({ cautions }: { cautions: readonly string[] }) {
  return (
    <div className="sheet-section sheet-cautions lg:col-span-2">
      <Caution title="Safety and selling">
        <ul className="mt-1 list-disc space-y-1 pl-5">
          {cautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
      </Caution>
    </div>
  );
}
