import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import type { AuditPage, AuditQuery } from '@fryline/schemas';
import { api } from '@fryline/ui/api-client';

export type AuditFilters = Partial<Pick<AuditQuery, 'kind' | 'actorId' | 'from' | 'to'>> & { page: number };

/** The query string with empty filters left out. */
export function auditSearch(filters: AuditFilters, pageSize = 50): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (value !== undefined && value !== '') params.set(key, String(value));
  params.set('pageSize', String(pageSize));
  return params.toString();
}

export const auditLogQueries = {
  page: (filters: AuditFilters) =>
    queryOptions({
      queryKey: ['audit-log', filters] as const,
      queryFn: () => api.get<AuditPage>(`/api/staff/audit-log?${auditSearch(filters)}`),
      placeholderData: keepPreviousData,
    }),
};
