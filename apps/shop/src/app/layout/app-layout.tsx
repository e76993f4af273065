import { Suspense, useEffect } from 'react';
import { Outlet, useLocation } from 'react-router-dom';
import { onPageChange } from '@fryline/ui/page-change';
import { SiteHeader } from './site-header';
import { SiteFooter } from './site-footer';
import { site } from '../../config/site';
import { PageErrorBoundary, LoadingState } from '@fryline/ui';

export function AppLayout() {
  const { pathname } = useLocation();
  useEffect(() => onPageChange(pathname), [pathname]);
  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#main" className="skip-link">
        Skip to content
      </a>
      <SiteHeader />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-5xl flex-1 px-4 py-6 sm:py-10">
        <PageErrorBoundary key={pathname} appName={site.name}>
          <Suspense fallback={<LoadingState />}>
            <Outlet />
          </Suspense>
        </PageErrorBoundary>
      </main>
      <SiteFooter />
    </div>
  );
}
