import { useState, type ReactNode } from 'react';
import { onlineManager } from '@tanstack/react-query';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { createQueryClient } from '@fryline/ui';
import { offlinePersistOptions } from '../lib/offline-cache';
import { registerCounterMutations, sendKeptChanges } from '../features/counter/api/counter-mutations';
import { loadConflicts } from '../features/counter/model/conflicts';

function staffQueryClient() {
  // gcTime a day: what is kept on the phone for a dead connection must outlive an idle hour in memory too
  const client = createQueryClient(10_000, 24 * 3600_000);
  registerCounterMutations(client);
  return client;
}

// The browser's own word on the connection from the first moment (after a reload with none, too).
if (typeof navigator !== 'undefined') onlineManager.setOnline(navigator.onLine);

/** The staff app's query client, its cache and waiting changes kept on the device (IndexedDB) for a dead connection. */
export function Providers({ children }: { children: ReactNode }) {
  const [queryClient] = useState(staffQueryClient);
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
