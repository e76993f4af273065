import { StrictMode, useState, type ReactNode } from 'react';
import { createRoot } from 'react-dom/client';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { shouldRetry } from './api-client';

/** Renders an app into the page's #root, in StrictMode. */
export function mountApp(app: ReactNode): void {
  const root = document.getElementById('root');
  if (!root) throw new Error('The page has no #root element');
  createRoot(root).render(<StrictMode>{app}</StrictMode>);
}

/**
 * The apps' TanStack Query client: queries count as fresh for `staleTime` ms
 * and are retried only for trouble on the way (`shouldRetry`); mutations are
 * never retried unless their own defaults say so. `gcTime` keeps unused
 * answers in memory longer (an app that keeps its cache on the device).
 */
export function createQueryClient(staleTime: number, gcTime?: number): QueryClient {
  return new QueryClient({ defaultOptions: { queries: { staleTime, retry: shouldRetry, ...(gcTime ? { gcTime } : {}) }, mutations: { retry: false } } });
}

/** One query client for the app's lifetime (see createQueryClient). */
export function QueryProvider({ staleTime, children }: { staleTime: number; children: ReactNode }) {
  const [queryClient] = useState(() => createQueryClient(staleTime));
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}
