import { useSyncExternalStore } from 'react';
import { get, set } from 'idb-keyval';

// Changes the server refused after they were made (collected on another
// device, surplus gone, too late to undo): kept on the phone until the
// counter person has dealt with each one.

export interface Conflict {
  id: string;
  /** What was tried, in words: "Hand over Ada Quillfeather". */
  what: string;
  /** The server's reason, in words. */
  reason: string;
  code: string;
  orderId?: string;
  at: string;
}

const KEY = 'fryline-counter-conflicts';
let conflicts: Conflict[] = [];
const listeners = new Set<() => void>();
let loaded: Promise<void> | null = null;

function emit() {
  for (const l of listeners) l();
  void set(KEY, conflicts).catch(() => undefined);
}

/** Reads what an earlier visit left; called once at start. */
export function loadConflicts(): Promise<void> {
  loaded ??= get<Conflict[]>(KEY)
    .then((stored) => {
      if (stored?.length) {
        const known = new Set(conflicts.map((c) => c.id));
        conflicts = [...stored.filter((c) => !known.has(c.id)), ...conflicts];
        for (const l of listeners) l();
      }
    })
    .catch(() => undefined);
  return loaded;
}

export function addConflict(conflict: Omit<Conflict, 'id' | 'at'>) {
  conflicts = [...conflicts, { ...conflict, id: crypto.randomUUID(), at: new Date().toISOString() }];
  emit();
}

export function dismissConflict(id: string) {
  conflicts = conflicts.filter((c) => c.id !== id);
  emit();
}

const subscribe = (l: () => void) => {
  listeners.add(l);
  return () => listeners.delete(l);
};

export function useConflicts(): Conflict[] {
  return useSyncExternalStore(subscribe, () => conflicts);
}
