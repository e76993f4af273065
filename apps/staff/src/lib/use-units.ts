import { useCallback, useSyncExternalStore } from 'react';
import { DEFAULT_UNITS, type Units } from './units';

/** Where this browser remembers the baker's choice of units. */
export const UNITS_STORAGE_KEY = 'fryline.staff.units';

const listeners = new Set<() => void>();

/** Reads a stored choice; anything unreadable falls back to grams and °C. */
export function parseUnits(raw: string | null): Units {
  if (raw === null) return DEFAULT_UNITS;
  try {
    const value = JSON.parse(raw) as Partial<Record<keyof Units, unknown>>;
    return {
      mass: value.mass === 'oz' ? 'oz' : 'g',
      temp: value.temp === 'F' ? 'F' : 'C',
    };
  } catch {
    return DEFAULT_UNITS;
  }
}

/** The last choice made in this page, for browsers that block storage. */
let inMemory: string | null = null;

function readRaw(): string | null {
  try {
    return window.localStorage.getItem(UNITS_STORAGE_KEY);
  } catch {
    return inMemory;
  }
}

function writeRaw(raw: string): void {
  inMemory = raw;
  try {
    window.localStorage.setItem(UNITS_STORAGE_KEY, raw);
  } catch {
    // Storage blocked: the choice holds until the page is reloaded.
  }
}

let cachedRaw: string | null | undefined;
let cached: Units = DEFAULT_UNITS;

function snapshot(): Units {
  const raw = readRaw();
  if (raw !== cachedRaw) {
    cachedRaw = raw;
    cached = parseUnits(raw);
  }
  return cached;
}

function subscribe(listener: () => void): () => void {
  listeners.add(listener);
  const onStorage = (event: StorageEvent) => {
    if (event.key === UNITS_STORAGE_KEY) listener();
  };
  window.addEventListener('storage', onStorage);
  return () => {
    listeners.delete(listener);
    window.removeEventListener('storage', onStorage);
  };
}

/** The units this browser shows (g or oz, °C or °F), and a setter that remembers them. */
export function useUnits(): [Units, (change: Partial<Units>) => void] {
  const units = useSyncExternalStore(subscribe, snapshot, () => DEFAULT_UNITS);
  const setUnits = useCallback((change: Partial<Units>) => {
    writeRaw(JSON.stringify({ ...snapshot(), ...change }));
    listeners.forEach((listener) => listener());
  }, []);
  return [units, setUnits];
}
