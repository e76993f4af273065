import type { ReactNode } from 'react';
import { QueryProvider } from '@fryline/ui';
import { ToastProvider } from '../components/toast';

export function Providers({ children }: { children: ReactNode }) {
  return (
    <QueryProvider staleTime={15_000}>
      <ToastProvider>{children}</ToastProvider>
    </QueryProvider>
  );
}
