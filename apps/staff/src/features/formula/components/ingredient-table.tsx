import { useFieldArray, useWatch, type UseFormReturn } from 'react-hook-form';
import type { z } from 'zod';
import { ingredientKinds, type saveFormulaSchema } from '@fryline/schemas';
import { formatMass } from '../../../lib/units';
import { blankIngredient, flourTotal, kindLabels, type FormulaFormValues, type Preview } from '../model/formula-form';
import { ListError, RemoveRowButton } from '../../../components/row-controls';
import { FormulaLinesFooter } from '../../../components/formula-lines-footer';

type FormulaForm = UseFormReturn<FormulaFormValues, unknown, z.output<typeof saveFormulaSchema>>;

const MAX_LINES = 30;

function FieldError({ id, message }: { id: string; message: string | undefined }) {
  if (!message) return null;
  return (
    <p id={id} className="field-error">
      {message}
    </p>
  );
}

/** The formula's lines: name, kind and baker's percentage, with live grams for the sample dough. */
export function IngredientTable({
  form,
  preview,
  sampleGrams,
  onSampleGrams,
}: {
  form: FormulaForm;
  preview: Preview;
  sampleGrams: number;
  onSampleGrams: (grams: number) => void;
}) {
  const { control, register, formState } = form;
  const lines = useFieldArray({ control, name: 'formula.ingredients' });
  const ingredients = useWatch({ control, name: 'formula.ingredients' }) ?? [];
  const errors = formState.errors.formula;
  const listError = errors?.ingredients?.root?.message ?? errors?.ingredients?.message;
  const flour = flourTotal(ingredients);

  return (
    <section aria-labelledby="lines-heading" className="card flex flex-col gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="lines-heading" className="text-xl">
          Ingredients
        </h2>
        <div className="w-40">
          <label htmlFor="sample-grams" className="field-label">
            Sample dough (g)
          </label>
          <input
            id="sample-grams"
            type="number"
            inputMode="decimal"
            min={1}
            step="any"
            className="field-input"
            value={Number.isFinite(sampleGrams) ? sampleGrams : ''}
            onChange={(event) => onSampleGrams(event.target.valueAsNumber)}
          />
        </div>
      </div>
      <table className="w-full">
        <caption className="sr-only">Formula lines, with grams for the sample dough</caption>
        <thead className="hidden text-left text-sm text-muted sm:table-header-group">
          <tr>
            <th scope="col" className="pb-1 font-extrabold">
              Ingredient
            </th>
            <th scope="col" className="pb-1 pl-2 font-extrabold">
              Kind
            </th>
            <th scope="col" className="pb-1 pl-2 font-extrabold">
              Baker’s %
            </th>
            <th scope="col" className="pb-1 pl-2 text-right font-extrabold">
              Sample
            </th>
            <td />
          </tr>
        </thead>
        <tbody>
          {lines.fields.map((field, i) => {
            const lineErrors = errors?.ingredients?.[i];
            const kind = ingredients[i]?.kind;
            const grams = preview.ok ? preview.scaled.ingredients[i]?.grams : undefined;
            const id = `line-${i}`;
            return (
              <tr
                key={field.id}
                className="grid grid-cols-[minmax(0,1fr)_5.5rem_auto] gap-x-2 gap-y-1 border-b border-line py-3 sm:table-row sm:py-0"
              >
                <td className="col-span-3 sm:py-2 sm:align-top">
                  <input
                    id={`${id}-name`}
                    className="field-input"
                    aria-label={`Line ${i + 1}: name`}
                    aria-invalid={lineErrors?.name ? true : undefined}
                    aria-describedby={lineErrors?.name ? `${id}-name-error` : undefined}
                    {...register(`formula.ingredients.${i}.name`)}
                  />
                  <FieldError id={`${id}-name-error`} message={lineErrors?.name?.message} />
                </td>
                <td className="col-span-3 sm:py-2 sm:pl-2 sm:align-top">
                  <select
                    className="field-input"
                    aria-label={`Line ${i + 1}: kind`}
                    {...register(`formula.ingredients.${i}.kind`)}
                  >
                    {ingredientKinds.map((k) => (
                      <option key={k} value={k}>
                        {kindLabels[k]}
                      </option>
                    ))}
                  </select>
                  {kind === 'butter' && (
                    <label className="mt-1 flex items-center gap-2 text-sm">
                      <input type="checkbox" {...register(`formula.ingredients.${i}.salted`)} />
                      Salted
                    </label>
                  )}
                </td>
                <td className="sm:w-28 sm:py-2 sm:pl-2 sm:align-top">
                  <input
                    type="number"
                    inputMode="decimal"
                    step="any"
                    min={0}
                    className="field-input text-right tabular-nums"
                    aria-label={`Line ${i + 1}: baker’s percentage`}
                    aria-invalid={lineErrors?.percent ? true : undefined}
                    aria-describedby={lineErrors?.percent ? `${id}-percent-error` : undefined}
                    {...register(`formula.ingredients.${i}.percent`, { valueAsNumber: true })}
                  />
                  <FieldError id={`${id}-percent-error`} message={lineErrors?.percent?.message} />
                </td>
                <td className="self-center text-right tabular-nums whitespace-nowrap sm:py-2 sm:pl-2 sm:align-middle">
                  {grams === undefined ? '—' : formatMass(grams, 'g')}
                </td>
                <td className="self-center text-right sm:py-2 sm:pl-2 sm:align-middle">
                  <RemoveRowButton
                    label={`Remove line ${i + 1}${ingredients[i]?.name ? ` (${ingredients[i]?.name})` : ''}`}
                    disabled={lines.fields.length <= 1}
                    onRemove={() => lines.remove(i)}
                  />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <ListError message={listError} />
      <FormulaLinesFooter flour={flour} canAdd={lines.fields.length < MAX_LINES} onAdd={() => lines.append(blankIngredient())} />
      <div className="grid gap-3 sm:grid-cols-2">
        <NumberField
          id="starter-hydration"
          label="Starter hydration (%)"
          help="Water per 100 g of flour in the starter."
          error={errors?.starterHydrationPercent?.message}
          registration={register('formula.starterHydrationPercent', { valueAsNumber: true })}
        />
        <NumberField
          id="roux-liquid"
          label="Roux milk per gram of flour"
          help="The milk roux cooks 1 part flour in this many parts milk (5 is usual)."
          error={errors?.rouxLiquidPerFlour?.message}
          registration={register('formula.rouxLiquidPerFlour', { valueAsNumber: true })}
        />
      </div>
    </section>
  );
}

function NumberField({
  id,
  label,
  help,
  error,
  registration,
}: {
  id: string;
  label: string;
  help: string;
  error: string | undefined;
  registration: ReturnType<FormulaForm['register']>;
}) {
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <input
        id={id}
        type="number"
        inputMode="decimal"
        step="any"
        min={0}
        className="field-input"
        aria-invalid={error ? true : undefined}
        aria-describedby={`${id}-help${error ? ` ${id}-error` : ''}`}
        {...registration}
      />
      <p id={`${id}-help`} className="mt-1 text-sm text-muted">
        {help}
      </p>
      <FieldError id={`${id}-error`} message={error} />
    </div>
  );
}
