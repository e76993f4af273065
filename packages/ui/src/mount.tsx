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
 * One TanStack Query client for the app's lifetime: queries count as fresh
 * for `staleTime` ms and are retried only for trouble on the way
 * (`shouldRetry`); mutations are never retried.
 */
export function QueryProvider({ staleTime, children }: { staleTime: number; children: ReactNode }) {
  const [queryClient] = useState(
    () => new QueryClient({ defaultOptions: { queries: { staleTime, retry: shouldRetry }, mutations: { retry: false } } }),
  );
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}
