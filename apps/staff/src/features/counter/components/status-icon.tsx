import type { RowState } from '../model/pickups';

// Small line icons beside every status word, so no state is told by colour alone.
const paths: Record<RowState | 'sending' | 'offline', string> = {
  waiting: 'M12 7v5l3 2M21 12a9 9 0 1 1-18 0 9 9 0 0 1 18 0z',
  late: 'M12 8v5M12 16.5v.5M10.3 3.9 2.4 18a2 2 0 0 0 1.7 3h15.8a2 2 0 0 0 1.7-3L13.7 3.9a2 2 0 0 0-3.4 0z',
  'may-no-show': 'M12 8v5M12 16.5v.5M10.3 3.9 2.4 18a2 2 0 0 0 1.7 3h15.8a2 2 0 0 0 1.7-3L13.7 3.9a2 2 0 0 0-3.4 0z',
  'handed-over': 'M5 12.5l4.5 4.5L19 7.5',
  'no-show': 'M8 8l8 8M16 8l-8 8M21 12a9 9 0 1 1-18 0 9 9 0 0 1 18 0z',
  refunded: 'M5.6 5.6l12.8 12.8M21 12a9 9 0 1 1-18 0 9 9 0 0 1 18 0z',
  cancelled: 'M5.6 5.6l12.8 12.8M21 12a9 9 0 1 1-18 0 9 9 0 0 1 18 0z',
  'not-paid': 'M5.6 5.6l12.8 12.8M21 12a9 9 0 1 1-18 0 9 9 0 0 1 18 0z',
  sending: 'M12 16V4M7 9l5-5 5 5M5 20h14',
  offline: 'M3 3l18 18M8.5 16.5a5 5 0 0 1 7 0M5 13a10 10 0 0 1 5-2.8M19 13a10 10 0 0 0-2.2-1.6M2 9.5a15 15 0 0 1 4.6-3M22 9.5A15 15 0 0 0 11 5.6',
};

export function StatusIcon({ name, className = 'h-5 w-5' }: { name: keyof typeof paths; className?: string }) {
  return (
    <svg viewBox="0 0 24 24" fill="none" stroke="currentColor" strokeWidth={2.4} strokeLinecap="round" strokeLinejoin="round" aria-hidden="true" className={`shrink-0 ${className}`}>
      <path d={paths[name]} />
    </svg>
  );
}
