import type { ReactNode } from 'react';

/** What an input needs to point at its help line and error. */
export function fieldAria(id: string, help: unknown, error: string | undefined) {
  const described = [help && `${id}-help`, error && `${id}-error`].filter(Boolean).join(' ') || undefined;
  return { 'aria-invalid': error ? (true as const) : undefined, 'aria-describedby': described };
}

/** A label (with its unit), the input, a help line and the error under it. */
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
  children: ReactNode;
}) {
  return (
    <div className={className}>
      <label htmlFor={id} className="field-label">
        {label}
        {unit && <span className="font-semibold text-muted"> ({unit})</span>}
        {optional && <span className="font-semibold text-muted"> · optional</span>}
      </label>
      {children}
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
