import type { ReactNode } from 'react';

/** What an input needs to point at its help line and error. */
export function fieldAria(id: string, help: unknown, error: string | undefined) {
  const described = [help && `${id}-help`, error && `${id}-error`].filter(Boolean).join(' ') || undefined;
  return { 'aria-invalid': error ? (true as const) : undefined, 'aria-describedby': described };
}

/** What the input inside a field needs: its id, its look, and pointers to its help line and error. */
export interface FieldInputProps {
  id: string;
  className: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string | undefined;
}

/**
 * A label (with its unit), the input, a help line and the error under it.
 * `children` is the input itself, or a function that draws it from the
 * props it needs (`{(input) => <input {...input} {...register('x')} />}`).
 */
export function FieldShell({
  id,
  label,
  unit,
  optional,
  help,
  error,
  className,
  children,
}: {
  id: string;
  label: ReactNode;
  unit?: string;
  optional?: boolean;
  help?: ReactNode;
  error?: string;
  className?: string;
  children: ReactNode | ((input: FieldInputProps) => ReactNode);
}) {
  return (
    <div className={className}>
      <label htmlFor={id} className="field-label">
        {label}
        {unit && <span className="font-semibold text-muted"> ({unit})</span>}
        {optional && <span className="font-semibold text-muted"> · optional</span>}
      </label>
      {typeof children === 'function' ? children({ id, className: 'field-input', ...fieldAria(id, help, error) }) : children}
      {help && (
        <p id={`${id}-help`} className="mt-1 text-sm text-muted">
          {help}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}
