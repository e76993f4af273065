import type { ReactNode } from 'react';

/** A standing safety caution (hot oil, selling home-made food). */
export function Caution({ title, children }: { title: string; children: ReactNode }) {
  return (
    <aside className="notice notice-warn" aria-label={title}>
      <p className="font-extrabold">{title}</p>
      {children}
    </aside>
  );
}
