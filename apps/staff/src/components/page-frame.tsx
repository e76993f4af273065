import type { ReactNode } from 'react';

interface PageFrameProps {
  /** Small line above the heading, e.g. the role or the area. */
  eyebrow?: string;
  title: string;
  intro?: ReactNode;
  children: ReactNode;
}

/** The common top of every staff page: a tab title, one h1, a short line on what the page is for. */
export function PageFrame({ eyebrow, title, intro, children }: PageFrameProps) {
  return (
    <section className="flex flex-col gap-6" aria-labelledby="page-heading">
      <title>{`${title} · Fryline staff`}</title>
      <header className="flex flex-col gap-1">
        {eyebrow && <p className="text-sm font-extrabold tracking-wide text-sugar-700 uppercase">{eyebrow}</p>}
        <h1 id="page-heading" tabIndex={-1} className="text-3xl">
          {title}
        </h1>
        {intro && <p className="max-w-2xl text-muted">{intro}</p>}
      </header>
      {children}
    </section>
  );
}
