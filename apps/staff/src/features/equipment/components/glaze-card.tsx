import { useState } from 'react';
import { useController, useFieldArray, useWatch } from 'react-hook-form';
import { allergens } from '@fryline/schemas';
import { formatPercent, trimmed } from '../../../lib/units';
import { MAX_GLAZE_PARTS, partShares, type GlazeValues } from '../model/glazes';
import type { SettingsPath } from '../model/settings-fields';
import { fieldAria } from '@fryline/ui';
import { fieldError, fieldId, SettingsField, TextSetting, type SettingsForm } from './settings-field';
import { ListError, RemoveRowButton } from '../../../components/row-controls';

/** One glaze recipe: name, amounts, parts, allergens, and a guarded remove. */
export function GlazeCard({
  form,
  index,
  isNew,
  onRename,
  onRemove,
}: {
  form: SettingsForm;
  index: number;
  /** Not saved yet: its id still follows its name. */
  isNew: boolean;
  onRename: (name: string) => void;
  onRemove: () => void;
}) {
  const base = `glazes.${index}` as const;
  const glaze = useWatch({ control: form.control, name: base });
  const hasErrors = form.formState.errors.glazes?.[index] !== undefined;
  const [open, setOpen] = useState(isNew);
  const [confirming, setConfirming] = useState(false);
  const title = glaze?.name?.trim() || 'New glaze';
  const headingId = fieldId(`${base}-heading`);

  return (
    <details
      open={open || hasErrors}
      onToggle={(event) => setOpen(event.currentTarget.open)}
      className="group rounded-2xl border border-line"
    >
      <summary className="flex cursor-pointer flex-wrap items-baseline gap-x-3 gap-y-1 rounded-2xl p-3 sm:px-4">
        <h3 id={headingId} className="text-lg">
          <span aria-hidden="true" className="mr-1 inline-block text-muted transition-transform group-open:rotate-90">
            ›
          </span>
          {title}
        </h3>
        {isNew && <span className="badge badge-plum">not saved yet</span>}
        {hasErrors && <span className="badge badge-bad">needs a look</span>}
        <span className="text-sm text-muted">{glaze ? glazeSummary(glaze) : ''}</span>
      </summary>
      <section aria-labelledby={headingId} className="flex flex-col gap-3 px-3 pb-4 sm:px-4">
        <div className="flex flex-wrap items-start justify-between gap-2">
          <p className="text-sm text-muted">
            Id <code className="font-mono">{glaze?.id}</code>
            {isNew ? ', made from the name.' : ': menu items link to it by this, and it stays when you rename the glaze.'}
          </p>
          {!confirming && (
            <button type="button" className="btn btn-quiet btn-small" onClick={() => setConfirming(true)}>
              Remove<span className="sr-only"> {title}</span>
            </button>
          )}
        </div>
        {confirming && (
          <div role="alert" className="notice notice-warn flex flex-col gap-2">
            <p>
              {isNew
                ? `Remove ${title}? It has not been saved yet.`
                : `Remove ${title}? Menu items that use it will be planned as plain, with no glaze made for them, until you link them to another glaze.`}
            </p>
            <div className="flex flex-wrap gap-2">
              <button type="button" className="btn btn-danger btn-small" onClick={onRemove}>
                Remove {title}
              </button>
              <button type="button" className="btn btn-quiet btn-small" onClick={() => setConfirming(false)}>
                Keep it
              </button>
            </div>
          </div>
        )}
        <TextSetting form={form} name={`${base}.name`} label="Name" extraError={fieldError(form, `${base}.id`)} onText={onRename} />
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-3">
          <SettingsField form={form} tempUnit="C" field={{ name: `${base}.gramsPerRing`, label: 'On each ring', unit: 'g' }} />
          <SettingsField form={form} tempUnit="C" field={{ name: `${base}.gramsPerHole`, label: 'On each hole', unit: 'g' }} />
          <SettingsField
            form={form}
            tempUnit="C"
            field={{ name: `${base}.extraPercent`, label: 'Extra for the bowl', unit: '%', optional: true }}
          />
        </div>
        <GlazeParts form={form} index={index} />
        <GlazeAllergens form={form} index={index} />
      </section>
    </details>
  );
}

/** "14 g a ring, 4 g a hole · Icing sugar, Whole milk, Vanilla extract": the recipe while it is folded away. */
function glazeSummary(glaze: GlazeValues): string {
  const grams = (value: number) => (Number.isFinite(value) ? trimmed(value, 1) : '?');
  const parts = glaze.parts.map((part) => part.name.trim()).filter(Boolean);
  return [`${grams(glaze.gramsPerRing)} g a ring, ${grams(glaze.gramsPerHole)} g a hole`, parts.join(', ')].filter(Boolean).join(' · ');
}

/** The recipe's parts by weight, each with its share of the glaze. */
function GlazeParts({ form, index }: { form: SettingsForm; index: number }) {
  const name = `glazes.${index}.parts` as const;
  const parts = useFieldArray({ control: form.control, name });
  const values = useWatch({ control: form.control, name }) ?? [];
  const shares = partShares(values.map((part) => ({ parts: Number(part?.parts) })));
  const listError = form.formState.errors.glazes?.[index]?.parts?.root?.message ?? fieldError(form, name);

  return (
    <div className="flex flex-col gap-2">
      <table className="w-full">
        <caption className="text-left font-extrabold">Parts by weight</caption>
        <thead className="hidden text-left text-sm text-muted sm:table-header-group">
          <tr>
            <th scope="col" className="pb-1 font-extrabold">
              Ingredient
            </th>
            <th scope="col" className="pb-1 pl-2 font-extrabold">
              Parts
            </th>
            <th scope="col" className="pb-1 pl-2 text-right font-extrabold">
              Share
            </th>
            <td />
          </tr>
        </thead>
        <tbody>
          {parts.fields.map((field, i) => {
            const row = `${name}.${i}` as const;
            const label = `Part ${i + 1}`;
            return (
              <tr
                key={field.id}
                className="grid grid-cols-[minmax(0,1fr)_auto_auto] gap-x-2 gap-y-1 border-b border-line py-2 last:border-b-0 sm:table-row sm:py-0"
              >
                <td className="col-span-3 sm:py-1.5 sm:align-top">
                  <CellInput form={form} name={`${row}.name`} label={`${label}: ingredient`} />
                </td>
                <td className="sm:w-28 sm:py-1.5 sm:pl-2 sm:align-top">
                  <CellInput form={form} name={`${row}.parts`} label={`${label}: parts by weight`} number />
                </td>
                <td className="self-center text-right tabular-nums whitespace-nowrap sm:py-1.5 sm:pl-2 sm:align-middle">
                  {formatPercent(shares[i] ?? 0, 0)}
                </td>
                <td className="self-center text-right sm:py-1.5 sm:pl-2 sm:align-middle">
                  <RemoveRowButton
                    label={`Remove part ${i + 1}${values[i]?.name ? ` (${values[i]?.name})` : ''}`}
                    disabled={parts.fields.length <= 1}
                    onRemove={() => parts.remove(i)}
                  />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
      <ListError message={listError} />
      <div>
        <button
          type="button"
          className="btn btn-quiet btn-small"
          disabled={parts.fields.length >= MAX_GLAZE_PARTS}
          onClick={() => parts.append({ name: '', parts: 1 }, { focusName: `${name}.${parts.fields.length}.name` })}
        >
          Add a part
        </button>
      </div>
    </div>
  );
}

/** An input in a table row: its column names it for the eye, `label` for a screen reader. */
function CellInput({ form, name, label, number = false }: { form: SettingsForm; name: SettingsPath; label: string; number?: boolean }) {
  const id = fieldId(name);
  const error = fieldError(form, name);
  const kind = number
    ? ({ type: 'number', inputMode: 'decimal', step: 'any', min: 0, className: 'field-input text-right tabular-nums' } as const)
    : ({ type: 'text', autoComplete: 'off', className: 'field-input' } as const);
  return (
    <>
      <input
        id={id}
        {...kind}
        aria-label={label}
        {...fieldAria(id, undefined, error)}
        {...form.register(name, number ? { setValueAs: (value: string) => (value === '' ? Number.NaN : Number(value)) } : {})}
      />
      {error && (
        <p id={`${id}-error`} className="field-error">
          {error}
        </p>
      )}
    </>
  );
}

/** Allergens the glaze brings, from the same list the menu uses. */
function GlazeAllergens({ form, index }: { form: SettingsForm; index: number }) {
  const { field } = useController({ control: form.control, name: `glazes.${index}.allergens` });
  const chosen: string[] = field.value ?? [];
  const toggle = (allergen: string, on: boolean) => {
    const others = chosen.filter((a) => a !== allergen && !(allergens as readonly string[]).includes(a));
    // The listed ones in the list's order, then anything saved that the list does not know.
    field.onChange([...allergens.filter((a) => (a === allergen ? on : chosen.includes(a))), ...others]);
  };
  return (
    <fieldset>
      <legend className="field-label">Allergens in this glaze</legend>
      <p className="mb-2 text-sm text-muted">Tick what its ingredients contain; check their labels.</p>
      <div className="flex flex-wrap gap-x-4 gap-y-1">
        {allergens.map((allergen) => (
          <label key={allergen} className="flex items-center gap-2">
            <input
              type="checkbox"
              checked={chosen.includes(allergen)}
              onChange={(event) => toggle(allergen, event.target.checked)}
              onBlur={field.onBlur}
            />
            {allergen}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
