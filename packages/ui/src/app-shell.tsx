import { Suspense, useEffect, type ReactNode } from 'react';
import { Link, Outlet, useLocation } from 'react-router-dom';
import { onPageChange } from './page-change';
import { PageErrorBoundary } from './page-error-boundary';
import { LoadingState } from './status';
import type { PhotoSource } from './menu-photo';

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

/** How tall the business's logo stands in a header, in CSS pixels. */
const LOGO_HEIGHT = 40;

/**
 * The header's home link: the business's logo (or a plain mark) and its
 * name, or `children` in place of the name. The logo's width and height are
 * set from its stored shape, so the header doesn't move when it loads; with
 * a logo the link is named by the logo's alt text (the name), and the
 * written name beside it isn't read out a second time.
 */
export function BrandLink({
  className = '',
  logo = null,
  name = null,
  children,
}: {
  className?: string;
  logo?: PhotoSource | null;
  name?: string | null;
  children?: ReactNode;
}) {
  const width = logo ? Math.round((LOGO_HEIGHT * logo.width) / logo.height) : 0;
  const label = children ?? name ?? <span className="sr-only">Home</span>;
  return (
    <Link to="/" className={`flex min-w-0 items-center gap-2 font-extrabold text-plum-800 no-underline ${className}`}>
      {logo && name ? (
        <>
          <img
            src={logo.src}
            srcSet={logo.srcset}
            sizes={`${width}px`}
            width={width}
            height={LOGO_HEIGHT}
            alt={name}
            className="h-10 w-auto max-w-[50vw] shrink-0 object-contain"
            data-shop-logo=""
          />
          <span aria-hidden="true">{label}</span>
        </>
      ) : (
        <>
          <span className="brand-mark" aria-hidden="true" />
          {label}
        </>
      )}
    </Link>
  );
}
