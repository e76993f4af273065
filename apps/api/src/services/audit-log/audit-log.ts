import { DateTime } from 'luxon';
import type { AuditEntryView, AuditKind, AuditPage, AuditQuery } from '@fryline/schemas';
import { findAuditPage, findAuditPeople } from '../../db/queries/audit-log.js';
import { shopSettings } from '../shop/settings.js';
import { summarize } from './summaries.js';

/** A page of the audit log; the dates are whole days in the shop's time zone. */
export async function listAuditLog(query: AuditQuery): Promise<AuditPage> {
  const { timeZone, currency } = await shopSettings();
  const dayStart = (date: string) => DateTime.fromISO(date, { zone: timeZone }).startOf('day');
  const { rows, total } = await findAuditPage(
    {
      kind: query.kind,
      actorId: query.actorId,
      fromInclusive: query.from ? dayStart(query.from).toJSDate() : undefined,
      toExclusive: query.to ? dayStart(query.to).plus({ days: 1 }).toJSDate() : undefined,
    },
    query.pageSize,
    (query.page - 1) * query.pageSize,
  );
  const entries: AuditEntryView[] = rows.map((r) => ({
    id: Number(r.id),
    at: new Date(r.created_at).toISOString(),
    kind: r.kind as AuditKind,
    action: r.action,
    summary: summarize({ action: r.action, details: r.details ?? {}, subject: r.subject_label, currency }),
    actor: r.actor_id ? { id: r.actor_id, name: r.actor_name ?? '', email: r.actor_email ?? '' } : null,
    subjectType: r.subject_type,
    subjectId: r.subject_id,
    details: r.details ?? {},
  }));
  return { entries, total, page: query.page, pageSize: query.pageSize, timeZone, people: await findAuditPeople() };
}
