import { useQuery } from '@tanstack/react-query';
import { useController, useWatch } from 'react-hook-form';
import { Caution, ErrorState, useMoney } from '@fryline/ui';
import { productionQueries } from '../../../lib/queries/production-queries';
import { UnitSwitch } from '../../../lib/unit-switch';
import { useUnits } from '../../../lib/use-units';
import { namesToPrice, priceProblem, priceUnitFor, type PriceUnit } from '../model/prices';
import { fieldError, fieldId, SettingsField, type SettingsForm } from './settings-field';
import { PriceInput } from './price-input';

const CENTS_PER_KG = 'prices.centsPerKg';

function priceLabel(name: string, unit: PriceUnit, missing = false) {
  return (
    <>
      {name}
      <span className="font-semibold text-muted"> ($/{unit})</span>
      {missing && <span className="badge badge-warn ml-2 align-middle">no price yet</span>}
    </>
  );
}

/** "stored as $4.41/kg", shown when prices are typed a pound. */
function storedAs(cents: number | undefined, unit: PriceUnit, money: (cents: number) => string): string | undefined {
  return unit === 'lb' && cents !== undefined && Number.isFinite(cents) ? `Kept as ${money(cents)}/kg` : undefined;
}

function joinNames(names: string[]): string {
  return names.length <= 1 ? names.join('') : `${names.slice(0, -1).join(', ')} and ${names.at(-1)}`;
}

/**
 * The price of every ingredient the production sheet's cost looks up (the
 * formula's lines and the glazes' parts), and of the frying oil.
 */
export function PricesSection({ form }: { form: SettingsForm }) {
  const money = useMoney();
  const [{ mass }] = useUnits();
  const unit = priceUnitFor(mass);
  const formulas = useQuery(productionQueries.formulas());
  const glazes = useWatch({ control: form.control, name: 'glazes' });
  const { field: prices } = useController({ control: form.control, name: CENTS_PER_KG });
  const { field: oil } = useController({ control: form.control, name: 'prices.fryingOilCentsPerKg' });
  const submitted = form.formState.submitCount > 0;

  const record = prices.value;
  const names = namesToPrice(formulas.data?.current.formula.ingredients, glazes ?? []);
  const missing = names.filter((n) => record[n.name] === undefined).map((n) => n.name);
  const unused = formulas.isSuccess ? Object.keys(record).filter((key) => !names.some((n) => n.name === key)).sort() : [];

  const setPrice = (name: string, cents: number | undefined) => {
    const next = { ...form.getValues(CENTS_PER_KG) };
    if (cents === undefined) delete next[name];
    else next[name] = cents;
    prices.onChange(next);
  };
  /** The oil always has a price: a blank one is held as NaN, which the form refuses (undefined would read back as the saved price). */
  const setOil = (next: number | undefined) => oil.onChange(next ?? Number.NaN);
  /** Our own words for a price the form refuses, else the form's or the server's. */
  const problem = (path: string, cents: number | undefined) => {
    const flagged = fieldError(form, path) ?? (submitted ? priceProblem(cents) : undefined);
    return flagged && (priceProblem(cents) ?? flagged);
  };

  return (
    <fieldset className="card flex flex-col gap-3" aria-describedby="prices-intro">
      <legend className="float-left w-full text-xl font-extrabold">Prices</legend>
      <div className="flex flex-wrap items-start justify-between gap-3">
        <p id="prices-intro" className="max-w-prose text-muted">
          What you pay for each ingredient, for the cost and margin on the production sheet. Prices are a kilogram beside
          grams, a pound beside ounces.
        </p>
        <UnitSwitch show={['mass']} />
      </div>
      {formulas.isPending && <p className="text-sm text-muted">Loading the formula’s ingredients…</p>}
      {formulas.isError && (
        <ErrorState error={formulas.error} title="The formula’s ingredients could not be loaded" onRetry={() => void formulas.refetch()} />
      )}
      {missing.length > 0 ? (
        <p className="notice notice-warn">
          No price yet for {joinNames(missing)}. The sheet’s cost leaves {missing.length === 1 ? 'it' : 'them'} out, so it
          comes out too low.
        </p>
      ) : (
        names.length > 0 && <p className="notice notice-ok">Every ingredient has a price.</p>
      )}
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
        {names.map(({ name, usedIn }, index) => {
          const path = `${CENTS_PER_KG}.${name}`;
          const cents = record[name];
          return (
            <PriceInput
              key={name}
              id={fieldId(`price-${index}-${name}`)}
              label={priceLabel(name, unit, cents === undefined)}
              unit={unit}
              cents={cents}
              onCents={(next) => setPrice(name, next)}
              help={[usedIn.join(', '), storedAs(cents, unit, money)].filter(Boolean).join(' · ')}
              error={problem(path, cents)}
            />
          );
        })}
      </div>
      {unused.length > 0 && (
        <div className="flex flex-col gap-2 rounded-2xl border border-line p-3">
          <p className="text-sm text-muted">
            Kept from before, for names the formula and glazes no longer use. They do no harm; forget them if you like.
          </p>
          <ul className="flex flex-wrap gap-2">
            {unused.map((name) => (
              <li key={name} className="flex items-center gap-2 rounded-full bg-crumb py-1 pr-1 pl-3 text-sm">
                <span>
                  {name} · {money(record[name] ?? 0)}/kg
                </span>
                <button type="button" className="btn btn-quiet btn-small" onClick={() => setPrice(name, undefined)}>
                  Forget<span className="sr-only"> the price of {name}</span>
                </button>
              </li>
            ))}
          </ul>
        </div>
      )}
      <h3 className="mt-2 text-lg">Frying oil</h3>
      <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
        <PriceInput
          id={fieldId('prices.fryingOilCentsPerKg')}
          label={priceLabel('Frying oil', unit)}
          unit={unit}
          cents={oil.value}
          onCents={setOil}
          help={storedAs(oil.value, unit, money)}
          error={problem('prices.fryingOilCentsPerKg', oil.value)}
        />
        <SettingsField
          form={form}
          tempUnit="C"
          field={{
            name: 'prices.oilBakesPerFill',
            label: 'Bake days one fill of oil lasts',
            whole: true,
            optional: true,
            help: 'Blank counts a fresh fill every bake day.',
          }}
        />
      </div>
      <Caution title="Reusing frying oil">
        <p>
          Strain it once it is cool and keep it covered. Throw it out sooner than planned if it darkens, foams, smells off
          or smokes before it reaches frying temperature.
        </p>
      </Caution>
    </fieldset>
  );
}
