import { formatMass, formatPercent, trimmed } from '../../../lib/units';
import type { Preview } from '../model/formula-form';

/** The sample batch as it goes into the mixer, the hydration, and any figure outside the usual range. */
export function FormulaPreview({ preview, sampleGrams }: { preview: Preview; sampleGrams: number }) {
  return (
    <section aria-labelledby="sample-heading" className="card flex flex-col gap-3">
      <h2 id="sample-heading" className="text-xl">
        Sample batch{Number.isFinite(sampleGrams) && sampleGrams > 0 ? ` of ${formatMass(sampleGrams, 'g')}` : ''}
      </h2>
      {!preview.ok ? (
        <p className="notice notice-bad">{preview.problem}</p>
      ) : (
        <SampleBatch scaled={preview.scaled} />
      )}
    </section>
  );
}

function SampleBatch({ scaled }: { scaled: Extract<Preview, { ok: true }>['scaled'] }) {
  const g = (grams: number) => formatMass(grams, 'g');
  return (
    <>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4">
        <div>
          <dt className="text-sm font-extrabold text-muted">Hydration</dt>
          <dd className="font-semibold">{formatPercent(scaled.hydrationPercent)}</dd>
          <dd className="text-sm text-muted">free water, starter water included</dd>
        </div>
        <div>
          <dt className="text-sm font-extrabold text-muted">With carried water</dt>
          <dd className="font-semibold">{formatPercent(scaled.hydrationWithCarriedWaterPercent)}</dd>
          <dd className="text-sm text-muted">adding the water in milk, egg and butter</dd>
        </div>
        <div>
          <dt className="text-sm font-extrabold text-muted">Total flour</dt>
          <dd className="font-semibold">{g(scaled.totalFlourGrams)}</dd>
          <dd className="text-sm text-muted">all percentages add up to {formatPercent(scaled.percentSum)}</dd>
        </div>
        {scaled.eggs && (
          <div>
            <dt className="text-sm font-extrabold text-muted">Eggs</dt>
            <dd className="font-semibold">
              {scaled.eggs.count} whole ({g(scaled.eggs.grams)})
            </dd>
          </div>
        )}
        {scaled.starter && (
          <div>
            <dt className="text-sm font-extrabold text-muted">Starter</dt>
            <dd className="font-semibold">{g(scaled.starter.grams)}</dd>
            <dd className="text-sm text-muted">
              {g(scaled.starter.flourGrams)} flour + {g(scaled.starter.waterGrams)} water;{' '}
              {formatPercent(scaled.starter.prefermentedFlourPercent)} of the flour prefermented
            </dd>
          </div>
        )}
        {scaled.roux && (
          <div>
            <dt className="text-sm font-extrabold text-muted">Milk roux</dt>
            <dd className="font-semibold">{g(scaled.roux.totalGrams)}</dd>
            <dd className="text-sm text-muted">
              {g(scaled.roux.flourGrams)} flour + {g(scaled.roux.milkGrams)} milk (1 : {trimmed(scaled.roux.liquidPerFlour, 2)})
            </dd>
          </div>
        )}
      </dl>
      <table className="w-full max-w-md">
        <caption className="pb-1 text-left font-extrabold">Into the mixer</caption>
        <thead className="sr-only">
          <tr>
            <th scope="col">Ingredient</th>
            <th scope="col">Weight</th>
          </tr>
        </thead>
        <tbody>
          {scaled.finalDough.map((row) => (
            <tr key={`${row.kind}-${row.name}`} className="border-b border-line">
              <th scope="row" className="py-1.5 pr-3 text-left font-semibold">
                {row.name}
              </th>
              <td className="py-1.5 text-right tabular-nums">{g(row.grams)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {scaled.warnings.length > 0 && (
        <div className="notice notice-warn">
          <p className="font-extrabold">Outside the usual range</p>
          <ul className="mt-1 list-disc space-y-1 pl-5">
            {scaled.warnings.map((warning) => (
              <li key={warning}>{warning}</li>
            ))}
          </ul>
        </div>
      )}
    </>
  );
}
