import type { ReactNode } from 'react';
import { QueryProvider } from '@fryline/ui';

export function Providers({ children }: { children: ReactNode }) {
  return <QueryProvider staleTime={10_000}>{children}</QueryProvider>;
}
