import { Suspense, useEffect, type ReactNode } from 'react';
import { Link, Outlet, useLocation } from 'react-router-dom';
import { onPageChange } from './page-change';
import { PageErrorBoundary } from './page-error-boundary';
import { LoadingState } from './status';

const mainWidth = {
  /** The shop: a reading width. */
  regular: 'max-w-5xl sm:py-10',
  /** The staff app: room for tables and the production sheet. */
  wide: 'max-w-6xl sm:py-8',
} as const;

interface AppShellProps {
  /** The app's name as the browser tab shows it ("Fryline", "Fryline staff"). */
  appName: string;
  header: ReactNode;
  footer?: ReactNode;
  width?: keyof typeof mainWidth;
}

/**
 * The frame of every page in both apps: a skip link, the app's header, one
 * <main> that takes focus after a page change, and the page itself inside an
 * error boundary (a page that fails to render keeps the header) and a loading
 * line while its code arrives.
 */
export function AppShell({ appName, header, footer, width = 'regular' }: AppShellProps) {
  const { pathname } = useLocation();
  useEffect(() => onPageChange(pathname), [pathname]);
  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#main" className="skip-link">
        Skip to content
      </a>
      {header}
      <main id="main" tabIndex={-1} className={`mx-auto w-full flex-1 px-4 py-6 ${mainWidth[width]}`}>
        <PageErrorBoundary key={pathname} appName={appName}>
          <Suspense fallback={<LoadingState />}>
            <Outlet />
          </Suspense>
        </PageErrorBoundary>
      </main>
      {footer}
    </div>
  );
}

/** The header's home link: Fryline's mark and the app's name. */
export function BrandLink({ className = '', children }: { className?: string; children: ReactNode }) {
  return (
    <Link to="/" className={`flex items-center gap-2 font-extrabold text-plum-800 no-underline ${className}`}>
      <span className="brand-mark" aria-hidden="true" />
      {children}
    </Link>
  );
}
