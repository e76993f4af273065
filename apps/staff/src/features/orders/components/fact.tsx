import type { ReactNode } from 'react';

/** One label and value of a description list (`<dl>`). */
export function Fact({ label, children, valueClassName }: { label: string; children: ReactNode; valueClassName?: string }) {
  return (
    <div>
      <dt className="text-sm font-extrabold text-muted">{label}</dt>
      <dd className={valueClassName}>{children}</dd>
    </div>
  );
}
