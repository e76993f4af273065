import { useEffect, useState } from 'react';

/** The current time, ticking every `ms`: for late marks, undo countdowns and no-show times. */
export function useNow(ms = 1000): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNow(Date.now()), ms);
    return () => clearInterval(t);
  }, [ms]);
  return now;
}
