import { useEffect, useState } from 'react';
import { get, useController, type UseFormReturn } from 'react-hook-form';
import type { ProductionSettingsInput } from '@fryline/schemas';
import { tempFromUnit, tempSymbol, tempToUnit, trimmed, type TempUnit } from '../../../lib/units';
import type { SettingsField as FieldDef } from '../model/settings-fields';

type SettingsForm = UseFormReturn<ProductionSettingsInput>;

function fieldId(name: string): string {
  return `setting-${name.replace(/\./g, '-')}`;
}

/** One numeric setting with its label, unit, help line and error. */
export function SettingsField({ form, field, tempUnit }: { form: SettingsForm; field: FieldDef; tempUnit: TempUnit }) {
  const id = fieldId(field.name);
  const error = get(form.formState.errors, field.name) as { message?: string } | undefined;
  const unit = field.temperature ? tempSymbol(tempUnit) : field.unit;
  const described = [field.help && `${id}-help`, error?.message && `${id}-error`].filter(Boolean).join(' ') || undefined;
  const inputProps = {
    id,
    type: 'number',
    inputMode: field.whole ? ('numeric' as const) : ('decimal' as const),
    step: field.whole ? 1 : 'any',
    className: 'field-input',
    'aria-invalid': error ? true : undefined,
    'aria-describedby': described,
  };
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {field.label}
        {unit && <span className="font-semibold text-muted"> ({unit})</span>}
        {field.optional && <span className="font-semibold text-muted"> · optional</span>}
      </label>
      {field.temperature ? (
        <TemperatureInput form={form} name={field.name} unit={tempUnit} inputProps={inputProps} />
      ) : (
        <input
          {...inputProps}
          {...form.register(field.name, {
            setValueAs: (value: string) => (value === '' ? (field.optional ? undefined : Number.NaN) : Number(value)),
          })}
        />
      )}
      {field.help && (
        <p id={`${id}-help`} className="mt-1 text-sm text-muted">
          {field.help}
        </p>
      )}
      {error?.message && (
        <p id={`${id}-error`} className="field-error">
          {error.message}
        </p>
      )}
    </div>
  );
}

/**
 * A temperature typed in °C or °F while the form keeps °C. The typed text is
 * kept as typed (so "37" on the way to "375" stays put) and shown afresh
 * when the scale changes or the form is reset.
 */
function TemperatureInput({
  form,
  name,
  unit,
  inputProps,
}: {
  form: SettingsForm;
  name: FieldDef['name'];
  unit: TempUnit;
  inputProps: Record<string, unknown>;
}) {
  const { field } = useController({ control: form.control, name });
  const celsius = typeof field.value === 'number' ? field.value : Number.NaN;
  const shown = (c: number) => (Number.isFinite(c) ? trimmed(tempToUnit(c, unit), 1) : '');
  const [text, setText] = useState(() => shown(celsius));

  useEffect(() => {
    const typed = text === '' ? Number.NaN : tempFromUnit(Number(text), unit);
    const same = Number.isNaN(typed) ? Number.isNaN(celsius) : Math.abs(typed - celsius) < 0.05;
    if (!same) setText(shown(celsius));
    // Only an outside change (a reset, another scale) rewrites what was typed.
  }, [celsius, unit]);

  return (
    <input
      {...inputProps}
      ref={field.ref}
      name={field.name}
      value={text}
      onBlur={field.onBlur}
      onChange={(event) => {
        setText(event.target.value);
        field.onChange(event.target.value === '' ? Number.NaN : tempFromUnit(Number(event.target.value), unit));
      }}
    />
  );
}
