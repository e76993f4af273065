import { useState, type ReactNode } from 'react';
import { onlineManager, QueryClient } from '@tanstack/react-query';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { shouldRetry } from '../lib/api-client';
import { offlinePersistOptions } from '../lib/offline-cache';
import { registerCounterMutations, sendKeptChanges } from '../features/counter/api/counter-mutations';
import { loadConflicts } from '../features/counter/model/conflicts';

function createQueryClient(): QueryClient {
  const client = new QueryClient({
    // gcTime a day: what is kept on the phone for a dead connection must outlive an idle hour in memory too
    defaultOptions: { queries: { staleTime: 10_000, retry: shouldRetry, gcTime: 24 * 3600_000 }, mutations: { retry: false } },
  });
  registerCounterMutations(client);
  return client;
}

// The browser's own word on the connection from the first moment (after a reload with none, too).
if (typeof navigator !== 'undefined') onlineManager.setOnline(navigator.onLine);

export function Providers({ children }: { children: ReactNode }) {
  const [queryClient] = useState(createQueryClient);
  return (
    <PersistQueryClientProvider
      client={queryClient}
      persistOptions={offlinePersistOptions}
      onSuccess={() => {
        void loadConflicts();
        sendKeptChanges(queryClient);
      }}
    >
      {children}
    </PersistQueryClientProvider>
  );
}
