import type { BakeDayStatus } from '@fryline/schemas';

const badges: Record<BakeDayStatus, { label: string; className: string }> = {
  upcoming: { label: 'Not open yet', className: 'badge-plum' },
  open: { label: 'Taking orders', className: 'badge-ok' },
  closed: { label: 'Orders closed', className: 'badge-warn' },
  done: { label: 'Done', className: '' },
};

export function BakeDayStatusBadge({ status }: { status: BakeDayStatus }) {
  const badge = badges[status];
  return <span className={`badge ${badge.className}`}>{badge.label}</span>;
}
