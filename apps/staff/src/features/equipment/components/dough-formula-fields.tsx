import { useFieldArray, useWatch } from 'react-hook-form';
import { FieldShell, fieldAria } from '@fryline/ui';
import { ingredientKinds, type FormulaList } from '@fryline/schemas';
import { flourPercent, kindLabels } from '../../../lib/ingredient-kinds';
import { ListError, RemoveRowButton } from '../../../components/row-controls';
import { FormulaLinesFooter } from '../../../components/formula-lines-footer';
import { doughFormulaFrom } from '../model/doughs';
import { fieldError, fieldId, type SettingsForm } from './settings-field';

const MAX_LINES = 30;

/** A saved formula version, in words: "Version 3 — more butter". */
export function versionLabel(v: { version: number; note: string }): string {
  if (v.version === 0) return 'The built-in starting formula';
  return `Version ${v.version}${v.note ? ` — ${v.note}` : ''}`;
}

/**
 * The lines of a flavoured dough's own formula (name, kind, baker's %), and
 * the saved formula version to start them again from.
 */
export function DoughFormulaFields({ form, index, formulas }: { form: SettingsForm; index: number; formulas: FormulaList | undefined }) {
  const base = `dough.variations.${index}.formula` as const;
  const lines = useFieldArray({ control: form.control, name: `${base}.ingredients`, keyName: 'key' });
  const ingredients = useWatch({ control: form.control, name: `${base}.ingredients` }) ?? [];
  const flour = flourPercent(ingredients);
  const listError = fieldError(form, `${base}.ingredients`) ?? fieldError(form, `${base}.ingredients.root`);
  const versions = formulas ? [formulas.current, ...formulas.versions.filter((v) => v.id !== formulas.current.id)] : [];
  const startFromId = fieldId(`${base}.startFrom`);
  return (
    <div className="flex flex-col gap-3 sm:col-span-2">
      <div className="flex flex-wrap items-end gap-2">
        <div className="min-w-60 flex-1">
          <label htmlFor={startFromId} className="field-label">
            Start the lines again from
          </label>
          <select
            id={startFromId}
            className="field-input"
            value=""
            disabled={versions.length === 0}
            onChange={(event) => {
              const chosen = versions.find((v) => String(v.version) === event.target.value);
              if (!chosen) return;
              const formula = doughFormulaFrom(chosen.formula);
              lines.replace(formula.ingredients);
              form.setValue(`${base}.starterHydrationPercent`, formula.starterHydrationPercent, { shouldDirty: true });
              form.setValue(`${base}.rouxLiquidPerFlour`, formula.rouxLiquidPerFlour, { shouldDirty: true });
              form.setValue(`${base}.starterFeed`, formula.starterFeed, { shouldDirty: true });
            }}
          >
            <option value="">{versions.length === 0 ? 'Loading the formula versions…' : 'Choose a formula version…'}</option>
            {versions.map((v) => (
              <option key={v.version} value={String(v.version)}>
                {versionLabel(v)}
              </option>
            ))}
          </select>
        </div>
      </div>
      <table className="w-full">
        <caption className="sr-only">Lines of this dough&apos;s own formula</caption>
        <thead className="hidden text-left text-sm text-muted sm:table-header-group">
          <tr>
            <th scope="col" className="pb-1 font-extrabold">Ingredient</th>
            <th scope="col" className="pb-1 pl-2 font-extrabold">Kind</th>
            <th scope="col" className="pb-1 pl-2 font-extrabold">Baker’s %</th>
            <td />
          </tr>
        </thead>
        <tbody>
          {lines.fields.map((field, j) => {
            const line = `${base}.ingredients.${j}` as const;
            const nameError = fieldError(form, `${line}.name`);
            const percentError = fieldError(form, `${line}.percent`);
            const who = `Dough ${index + 1}, line ${j + 1}`;
            return (
              <tr key={field.key} className="grid grid-cols-[minmax(0,1fr)_auto] gap-x-2 gap-y-1 border-b border-line py-3 sm:table-row sm:py-0">
                <td className="col-span-2 sm:py-2 sm:align-top">
                  <input
                    id={fieldId(`${line}.name`)}
                    className="field-input"
                    aria-label={`${who}: name`}
                    {...fieldAria(fieldId(`${line}.name`), undefined, nameError)}
                    {...form.register(`${line}.name`)}
                  />
                  {nameError && <p id={`${fieldId(`${line}.name`)}-error`} className="field-error">{nameError}</p>}
                </td>
                <td className="col-span-2 sm:py-2 sm:pl-2 sm:align-top">
                  <select className="field-input" aria-label={`${who}: kind`} {...form.register(`${line}.kind`)}>
                    {ingredientKinds.map((k) => (
                      <option key={k} value={k}>
                        {kindLabels[k]}
                      </option>
                    ))}
                  </select>
                </td>
                <td className="sm:w-28 sm:py-2 sm:pl-2 sm:align-top">
                  <input
                    id={fieldId(`${line}.percent`)}
                    type="number"
                    inputMode="decimal"
                    step="any"
                    min={0}
                    className="field-input text-right tabular-nums"
                    aria-label={`${who}: baker’s percentage`}
                    {...fieldAria(fieldId(`${line}.percent`), undefined, percentError)}
                    {...form.register(`${line}.percent`, { setValueAs: (v: string) => (v === '' ? Number.NaN : Number(v)) })}
                  />
                  {percentError && <p id={`${fieldId(`${line}.percent`)}-error`} className="field-error">{percentError}</p>}
                </td>
                <td className="self-center text-right sm:py-2 sm:pl-2 sm:align-middle">
                  <RemoveRowButton
                    label={`Remove ${who.toLowerCase()}${ingredients[j]?.name ? ` (${ingredients[j]?.name})` : ''}`}
                    disabled={lines.fields.length <= 1}
                    onRemove={() => lines.remove(j)}
                  />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <ListError message={listError} />
      <FormulaLinesFooter flour={flour} canAdd={lines.fields.length < MAX_LINES} onAdd={() => lines.append({ name: '', percent: 0, kind: 'other' })} />
      <FieldShell id={fieldId(`${base}.starterHydrationPercent`)} label="Starter hydration" unit="%" error={fieldError(form, `${base}.starterHydrationPercent`)}>
        <input
          id={fieldId(`${base}.starterHydrationPercent`)}
          type="number"
          inputMode="decimal"
          step="any"
          className="field-input"
          {...fieldAria(fieldId(`${base}.starterHydrationPercent`), undefined, fieldError(form, `${base}.starterHydrationPercent`))}
          {...form.register(`${base}.starterHydrationPercent`, { setValueAs: (v: string) => (v === '' ? undefined : Number(v)) })}
        />
      </FieldShell>
    </div>
  );
}
