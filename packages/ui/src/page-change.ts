let lastPath: string | undefined;

/**
 * Call on every route change of a single-page app. After a move to another
 * page it scrolls to the top and puts focus on the new page's main heading,
 * so keyboard and screen-reader users start there. The first page load, and
 * a repeat call for the same path, are left alone.
 */
export function onPageChange(pathname: string): void {
  const previous = lastPath;
  lastPath = pathname;
  if (previous === undefined || previous === pathname) return;
  window.scrollTo(0, 0);
  const target = document.querySelector<HTMLElement>('main h1') ?? document.querySelector<HTMLElement>('main');
  target?.focus({ preventScroll: true });
}
