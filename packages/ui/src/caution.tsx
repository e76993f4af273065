import type { ReactNode } from 'react';

/** A standing safety caution (allergens, hot oil, selling home-made food), named by its title. */
export function Caution({ title, className = '', children }: { title: string; className?: string; children: ReactNode }) {
  return (
    <aside className={`notice notice-warn ${className}`} aria-label={title}>
      <p className="font-extrabold">{title}</p>
      {children}
    </aside>
  );
}
