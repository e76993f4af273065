import { useEffect } from 'react';
import { Outlet, useLocation } from 'react-router-dom';
import { onPageChange } from '@fryline/ui/page-change';
import { StaffHeader } from './staff-header';

export function StaffLayout() {
  const { pathname } = useLocation();
  useEffect(() => onPageChange(pathname), [pathname]);
  return (
    <div className="flex min-h-dvh flex-col">
      <a href="#main" className="skip-link">
        Skip to content
      </a>
      <StaffHeader />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 sm:py-8">
        <Outlet />
      </main>
    </div>
  );
}
