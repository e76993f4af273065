import { useFieldArray, useWatch } from 'react-hook-form';
import { useQuery } from '@tanstack/react-query';
import { FieldShell, fieldAria } from '@fryline/ui';
import { productionQueries } from '../../../lib/queries/production-queries';
import { madeFrom, withAddIns, withOwnFormula, type DoughMadeFrom } from '../model/doughs';
import { glazeIdFrom } from '../model/glazes';
import { DoughFormulaFields } from './dough-formula-fields';
import { fieldError, fieldId, type SettingsForm } from './settings-field';

/** Flavours typed as a list, "Lemon zest, Orange": each trimmed, blanks dropped. */
export function flavourList(text: string): string[] {
  return text.split(',').map((f) => f.trim()).filter((f) => f !== '');
}

const MADE_FROM: Array<{ value: DoughMadeFrom; label: string }> = [
  { value: 'add-ins', label: 'The base dough with add-ins' },
  { value: 'own-formula', label: 'A formula of its own' },
];

/**
 * The flavoured doughs, for the menu flavours named here: a share of the
 * base dough with add-ins folded in, or a dough of its own formula, started
 * from a saved formula version and edited here.
 */
export function DoughsSection({ form }: { form: SettingsForm }) {
  const list = useFieldArray({ control: form.control, name: 'dough.variations', keyName: 'key' });
  const doughs = useWatch({ control: form.control, name: 'dough.variations' }) ?? [];
  const listError = fieldError(form, 'dough.variations');
  const formulas = useQuery(productionQueries.formulas()).data;
  const choose = (index: number, value: DoughMadeFrom) => {
    const dough = form.getValues(`dough.variations.${index}`);
    if (!dough || madeFrom(dough) === value) return;
    if (value === 'own-formula' && !formulas) return;
    list.update(index, value === 'own-formula' ? withOwnFormula(dough, formulas!.current.formula) : withAddIns(dough));
  };
  return (
    <fieldset className="card flex flex-col gap-3" aria-describedby="doughs-intro">
      <legend className="float-left w-full text-xl font-extrabold">Flavoured doughs</legend>
      <p id="doughs-intro" className="max-w-prose text-muted">
        A menu flavour can take its own dough. The sheet weighs off a share of the base dough for it, with the add-ins per
        kilogram of dough, and keeps its pieces apart on the trays and in the fryer so the glazes land on the right ones.
      </p>
      {list.fields.length === 0 && <p className="text-muted">None: every flavour is made from the base dough.</p>}
      <ol className="flex flex-col gap-3">
        {list.fields.map((field, index) => {
          const dough = doughs[index];
          const base = `dough.variations.${index}` as const;
          const flavoursId = fieldId(`${base}.flavours`);
          const flavoursError = fieldError(form, `${base}.flavours`);
          return (
            <li key={field.key} className="rounded-lg border border-line p-3">
              <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
                <FieldShell id={fieldId(`${base}.name`)} label="Dough name" error={fieldError(form, `${base}.name`)}>
                  <input
                    id={fieldId(`${base}.name`)}
                    type="text"
                    className="field-input"
                    {...fieldAria(fieldId(`${base}.name`), undefined, fieldError(form, `${base}.name`))}
                    {...form.register(`${base}.name`, {
                      onChange: (event: { target: { value: string } }) => {
                        if (!dough?.id || dough.id.startsWith('new-dough')) {
                          form.setValue(`${base}.id`, glazeIdFrom(event.target.value, doughs.filter((_, i) => i !== index).map((d) => d.id)));
                        }
                      },
                    })}
                  />
                </FieldShell>
                <FieldShell id={flavoursId} label="Menu flavours" help="As written on the menu items, separated by commas." error={flavoursError}>
                  <input
                    id={flavoursId}
                    type="text"
                    className="field-input"
                    {...fieldAria(flavoursId, 'As written on the menu items, separated by commas.', flavoursError)}
                    defaultValue={(dough?.flavours ?? []).join(', ')}
                    onChange={(event) => form.setValue(`${base}.flavours`, flavourList(event.target.value), { shouldDirty: true })}
                  />
                </FieldShell>
                <fieldset className="sm:col-span-2">
                  <legend className="field-label">Made from</legend>
                  <div className="flex flex-wrap gap-x-5 gap-y-1">
                    {MADE_FROM.map((option) => (
                      <label key={option.value} className="flex items-center gap-2">
                        <input
                          type="radio"
                          name={`${base}.madeFrom`}
                          value={option.value}
                          checked={madeFrom(dough) === option.value}
                          disabled={option.value === 'own-formula' && !formulas && madeFrom(dough) !== 'own-formula'}
                          onChange={() => choose(index, option.value)}
                        />
                        {option.label}
                      </label>
                    ))}
                  </div>
                  {madeFrom(dough) === 'add-ins' && (
                    <p className="text-sm text-muted">A formula of its own starts as a copy of the current formula version; change its lines below.</p>
                  )}
                </fieldset>
                {dough?.formula ? (
                  <DoughFormulaFields form={form} index={index} formulas={formulas} />
                ) : (
                  <>
                    {(dough?.addIns ?? []).map((_addIn, j) => (
                      <div key={j} className="contents">
                        <FieldShell id={fieldId(`${base}.addIns.${j}.name`)} label="Add-in" error={fieldError(form, `${base}.addIns.${j}.name`)}>
                          <input id={fieldId(`${base}.addIns.${j}.name`)} type="text" className="field-input" {...form.register(`${base}.addIns.${j}.name`)} />
                        </FieldShell>
                        <FieldShell id={fieldId(`${base}.addIns.${j}.gramsPerKg`)} label="Per kg of dough" unit="g" error={fieldError(form, `${base}.addIns.${j}.gramsPerKg`)}>
                          <input
                            id={fieldId(`${base}.addIns.${j}.gramsPerKg`)}
                            type="number"
                            inputMode="decimal"
                            step="any"
                            className="field-input"
                            {...form.register(`${base}.addIns.${j}.gramsPerKg`, { setValueAs: (v: string) => (v === '' ? Number.NaN : Number(v)) })}
                          />
                        </FieldShell>
                      </div>
                    ))}
                    <FieldShell id={fieldId(`${base}.addAt`)} label="Fold the add-ins in">
                      <select id={fieldId(`${base}.addAt`)} className="field-input" {...form.register(`${base}.addAt`)}>
                        <option value="after-mix">Straight after mixing</option>
                        <option value="at-shaping">When shaping, before the fridge</option>
                      </select>
                    </FieldShell>
                  </>
                )}
              </div>
              <div className="mt-2 flex flex-wrap gap-2">
                {!dough?.formula && (
                  <button
                    type="button"
                    className="btn btn-quiet"
                    onClick={() => form.setValue(`${base}.addIns`, [...(dough?.addIns ?? []), { name: '', gramsPerKg: 10 }], { shouldDirty: true })}
                  >
                    Add an add-in
                  </button>
                )}
                <button type="button" className="btn btn-quiet" onClick={() => list.remove(index)}>
                  Remove {dough?.name.trim() || 'this dough'}
                </button>
              </div>
            </li>
          );
        })}
      </ol>
      {listError && (
        <p role="alert" className="field-error">
          {listError}
        </p>
      )}
      <div>
        <button
          type="button"
          className="btn btn-quiet"
          onClick={() => list.append({ id: glazeIdFrom('new dough', doughs.map((d) => d.id)), name: '', flavours: [], addIns: [{ name: '', gramsPerKg: 10 }], addAt: 'after-mix' })}
        >
          Add a flavoured dough
        </button>
      </div>
    </fieldset>
  );
}
