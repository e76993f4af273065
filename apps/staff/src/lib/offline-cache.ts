import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import type { PersistQueryClientOptions } from '@tanstack/react-query-persist-client';
import { del, get, set } from 'idb-keyval';

// What the staff app keeps on the device for a dead connection: who is
// signed in, the counter's lists, and every change still waiting to be sent.
// IndexedDB (through idb-keyval) rather than localStorage: it is not limited
// to a few megabytes and does not block the page while it writes.

const KEEP = new Set(['me', 'counter']);

export const offlinePersistOptions: Omit<PersistQueryClientOptions, 'queryClient'> = {
  persister: createAsyncStoragePersister({
    storage: { getItem: (key) => get<string>(key).then((v) => v ?? null), setItem: (key, value) => set(key, value), removeItem: (key) => del(key) },
    key: 'fryline-staff-cache',
    throttleTime: 300,
  }),
  maxAge: 24 * 3600_000,
  buster: 'counter-1',
  dehydrateOptions: {
    // "nobody signed in" is not kept: after signing in, the app must ask again
    shouldDehydrateQuery: (query) =>
      query.state.status === 'success' && query.state.data != null && KEEP.has(String(query.queryKey[0])) && query.queryKey[1] !== 'by-code',
    // waiting for a connection, or on their way: both must survive a reload
    shouldDehydrateMutation: (mutation) => mutation.state.status === 'pending',
  },
};

/** Forgets everything kept on the device (at sign-out: the next person starts clean). */
export function clearOfflineCache(): Promise<void> {
  return offlinePersistOptions.persister.removeClient() as Promise<void>;
}
