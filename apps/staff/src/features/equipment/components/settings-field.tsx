import { useEffect, useState, type ReactNode } from 'react';
import { get, useController, type UseFormReturn } from 'react-hook-form';
import type { ProductionSettingsInput } from '@fryline/schemas';
import { tempFromUnit, tempSymbol, tempToUnit, trimmed, type TempUnit } from '../../../lib/units';
import type { SettingsField as FieldDef, SettingsPath } from '../model/settings-fields';
import { FieldShell, fieldAria } from '@fryline/ui';

export type SettingsForm = UseFormReturn<ProductionSettingsInput>;

export function fieldId(name: string): string {
  return `setting-${name.replace(/[^A-Za-z0-9_-]+/g, '-')}`;
}

/** The error the form holds for a field, if any. */
export function fieldError(form: SettingsForm, name: string): string | undefined {
  return (get(form.formState.errors, name) as { message?: string } | undefined)?.message;
}

/** One numeric setting with its label, unit, help line and error. */
export function SettingsField({ form, field, tempUnit }: { form: SettingsForm; field: FieldDef; tempUnit: TempUnit }) {
  const id = fieldId(field.name);
  const error = fieldError(form, field.name);
  const unit = field.temperature ? tempSymbol(tempUnit) : field.unit;
  const inputProps = {
    id,
    type: 'number',
    inputMode: field.whole ? ('numeric' as const) : ('decimal' as const),
    step: field.whole ? 1 : 'any',
    className: 'field-input',
    ...fieldAria(id, field.help, error),
  };
  return (
    <FieldShell id={id} label={field.label} unit={unit} optional={field.optional} help={field.help} error={error}>
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
    </FieldShell>
  );
}

/** One text setting (a glaze's name); `onText` hears each change. */
export function TextSetting({
  form,
  name,
  label,
  help,
  extraError,
  onText,
}: {
  form: SettingsForm;
  name: SettingsPath;
  label: string;
  help?: ReactNode;
  /** Another field's error that belongs beside this input (the id made from the name). */
  extraError?: string;
  onText?: (text: string) => void;
}) {
  const id = fieldId(name);
  const error = fieldError(form, name) ?? extraError;
  return (
    <FieldShell id={id} label={label} help={help} error={error}>
      <input
        id={id}
        type="text"
        autoComplete="off"
        className="field-input"
        {...fieldAria(id, help, error)}
        {...form.register(name, { onChange: (event: { target: { value: string } }) => onText?.(event.target.value) })}
      />
    </FieldShell>
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
