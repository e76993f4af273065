import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import { auditKindLabels, auditKinds, type AuditEntryView, type AuditKind } from '@fryline/schemas';
import { ErrorState, LoadingState } from '@fryline/ui';
import { formatDateTime } from '@fryline/ui/format';
import { PageFrame } from '../../../components/page-frame';
import { auditLogQueries, type AuditFilters } from '../api/audit-log-queries';

const PAGE_SIZE = 50;
const isKind = (value: string | null): value is AuditKind => value !== null && (auditKinds as readonly string[]).includes(value);

function who(entry: AuditEntryView): string {
  if (!entry.actor) return 'The system';
  return entry.actor.name || entry.actor.email;
}

/** `/staff/audit-log`: who changed what and when, newest first, filtered in the address bar so a view can be shared. */
export function AuditLogPage() {
  const [search, setSearch] = useSearchParams();
  const filters: AuditFilters = {
    kind: isKind(search.get('kind')) ? (search.get('kind') as AuditKind) : undefined,
    actorId: search.get('person') || undefined,
    from: search.get('from') || undefined,
    to: search.get('to') || undefined,
    page: Math.max(1, Number(search.get('page')) || 1),
  };
  const log = useQuery(auditLogQueries.page(filters));
  const set = (key: string, value: string) => {
    const next = new URLSearchParams(search);
    if (value) next.set(key, value);
    else next.delete(key);
    if (key !== 'page') next.delete('page');
    setSearch(next, { replace: true });
  };
  const pages = log.data ? Math.max(1, Math.ceil(log.data.total / PAGE_SIZE)) : 1;

  return (
    <PageFrame eyebrow="Owner" title="Audit log" intro="Every change to capacity, prices, the menu, refunds, staff roles, pickups, called-off bake days and settings: who made it and when.">
      <form className="card grid gap-3 sm:grid-cols-2 lg:grid-cols-4" aria-label="Filter the log" onSubmit={(e) => e.preventDefault()}>
        <div>
          <label htmlFor="log-kind" className="field-label">Kind of change</label>
          <select id="log-kind" className="field-input" value={filters.kind ?? ''} onChange={(e) => set('kind', e.target.value)}>
            <option value="">Everything</option>
            {auditKinds.map((k) => (
              <option key={k} value={k}>
                {auditKindLabels[k]}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="log-person" className="field-label">Person</label>
          <select id="log-person" className="field-input" value={filters.actorId ?? ''} onChange={(e) => set('person', e.target.value)}>
            <option value="">Anyone</option>
            {(log.data?.people ?? []).map((p) => (
              <option key={p.id} value={p.id}>
                {p.name || p.email}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor="log-from" className="field-label">From</label>
          <input id="log-from" type="date" className="field-input" value={filters.from ?? ''} max={filters.to} onChange={(e) => set('from', e.target.value)} />
        </div>
        <div>
          <label htmlFor="log-to" className="field-label">To</label>
          <input id="log-to" type="date" className="field-input" value={filters.to ?? ''} min={filters.from} onChange={(e) => set('to', e.target.value)} />
        </div>
      </form>

      {log.isPending ? (
        <LoadingState label="Loading the log…" />
      ) : log.isError ? (
        <ErrorState error={log.error} title="The log could not be loaded" onRetry={() => void log.refetch()} />
      ) : (
        <section aria-labelledby="log-heading" className="flex flex-col gap-3">
          <h2 id="log-heading" className="text-xl">
            {log.data.total === 0 ? 'No changes match' : `${log.data.total} change${log.data.total === 1 ? '' : 's'}`}
            <span className="text-base font-semibold text-muted"> · times in {log.data.timeZone}</span>
          </h2>
          {log.data.entries.length > 0 && (
            // scrolls sideways on a phone, so it takes the focus for the arrow keys
            <div className="card overflow-x-auto p-0" tabIndex={0} role="region" aria-labelledby="log-heading">
              <table className="w-full text-left text-sm">
                <thead className="border-b border-line bg-crumb">
                  <tr>
                    <th scope="col" className="px-3 py-2">When</th>
                    <th scope="col" className="px-3 py-2">Who</th>
                    <th scope="col" className="px-3 py-2">Kind</th>
                    <th scope="col" className="px-3 py-2">What</th>
                  </tr>
                </thead>
                <tbody>
                  {log.data.entries.map((entry) => (
                    <tr key={entry.id} className="border-b border-line align-top last:border-b-0">
                      <td className="px-3 py-2 whitespace-nowrap">
                        <time dateTime={entry.at}>{formatDateTime(entry.at, log.data.timeZone)}</time>
                      </td>
                      <td className="px-3 py-2">{who(entry)}</td>
                      <td className="px-3 py-2 whitespace-nowrap">
                        <span className="badge badge-plum">{auditKindLabels[entry.kind] ?? entry.kind}</span>
                      </td>
                      <td className="px-3 py-2">{entry.summary}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          {pages > 1 && (
            <nav aria-label="Pages of the log" className="flex items-center gap-3">
              <button type="button" className="btn btn-quiet btn-small" disabled={filters.page <= 1} onClick={() => set('page', String(filters.page - 1))}>
                Newer
              </button>
              <span>
                Page {filters.page} of {pages}
              </span>
              <button type="button" className="btn btn-quiet btn-small" disabled={filters.page >= pages} onClick={() => set('page', String(filters.page + 1))}>
                Older
              </button>
            </nav>
          )}
        </section>
      )}
    </PageFrame>
  );
}
