import type { ReactNode } from 'react';
import { FieldShell, fieldAria } from '@fryline/ui';

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
  return (
    <FieldShell id={id} label={label} optional={optional} help={help} error={error} className={className}>
      {children({ id, className: 'field-input', ...fieldAria(id, help, error) })}
    </FieldShell>
  );
}
