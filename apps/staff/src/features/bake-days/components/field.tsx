import type { ReactNode } from 'react';

/** What the input inside a field needs: its id, its look, and pointers to its help line and error. */
export interface FieldInputProps {
  id: string;
  className: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string | undefined;
}

/**
 * A label, the input (drawn by `children` with the props it needs), a help
 * line and the error under it.
 */
export function Field({
  id,
  label,
  optional,
  help,
  error,
  className,
  children,
}: {
  id: string;
  label: ReactNode;
  optional?: boolean;
  help?: ReactNode;
  error?: string;
  className?: string;
  children: (input: FieldInputProps) => ReactNode;
}) {
  const describedBy = [help && `${id}-help`, error && `${id}-error`].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="field-label">
        {label}
        {optional && <span className="font-semibold text-muted"> · optional</span>}
      </label>
      {children({ id, className: 'field-input', 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
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
