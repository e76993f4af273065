import { QueryTypes } from 'sequelize';
import { database } from '../sequelize.js';

export interface AuditRow {
  id: number;
  created_at: Date;
  kind: string;
  action: string;
  subject_type: string;
  subject_id: string | null;
  details: Record<string, unknown>;
  actor_id: string | null;
  actor_name: string | null;
  actor_email: string | null;
  /** What the subject is called now: a person's name or address, a bake day's date and place, an order's pickup code. */
  subject_label: string | null;
}

export interface AuditFilter {
  kind?: string;
  actorId?: string;
  fromInclusive?: Date;
  toExclusive?: Date;
}

function where(filter: AuditFilter): { sql: string; replacements: Record<string, unknown> } {
  const parts: string[] = [];
  const replacements: Record<string, unknown> = {};
  if (filter.kind) {
    parts.push('a.kind = :kind');
    replacements.kind = filter.kind;
  }
  if (filter.actorId) {
    parts.push('a.actor_id = :actorId');
    replacements.actorId = filter.actorId;
  }
  if (filter.fromInclusive) {
    parts.push('a.created_at >= :from');
    replacements.from = filter.fromInclusive.toISOString();
  }
  if (filter.toExclusive) {
    parts.push('a.created_at < :to');
    replacements.to = filter.toExclusive.toISOString();
  }
  return { sql: parts.length ? `WHERE ${parts.join(' AND ')}` : '', replacements };
}

/** One page of the log, newest first, with the names of who did it and what it was done to. */
export async function findAuditPage(filter: AuditFilter, limit: number, offset: number): Promise<{ rows: AuditRow[]; total: number }> {
  const w = where(filter);
  const rows = await database().query<AuditRow>(
    `SELECT a.id, a.created_at, a.kind, a.action, a.subject_type, a.subject_id, a.details,
            a.actor_id, actor.name AS actor_name, actor.email AS actor_email,
            CASE a.subject_type
              WHEN 'user' THEN COALESCE(NULLIF(su.name, ''), su.email)
              WHEN 'bake_day' THEN to_char(sd.date, 'YYYY-MM-DD') || ', ' || sd.place
              WHEN 'order' THEN so.pickup_code
              WHEN 'menu_item' THEN sm.name
            END AS subject_label
       FROM audit_log a
       LEFT JOIN users actor ON actor.id = a.actor_id
       LEFT JOIN users su ON a.subject_type = 'user' AND su.id::text = a.subject_id
       LEFT JOIN bake_days sd ON a.subject_type = 'bake_day' AND sd.id::text = a.subject_id
       LEFT JOIN orders so ON a.subject_type = 'order' AND so.id::text = a.subject_id
       LEFT JOIN menu_items sm ON a.subject_type = 'menu_item' AND sm.id::text = a.subject_id
       ${w.sql}
      ORDER BY a.created_at DESC, a.id DESC
      LIMIT :limit OFFSET :offset`,
    { replacements: { ...w.replacements, limit, offset }, type: QueryTypes.SELECT },
  );
  const [count] = await database().query<{ n: number }>(`SELECT count(*) AS n FROM audit_log a ${w.sql}`, {
    replacements: w.replacements,
    type: QueryTypes.SELECT,
  });
  return { rows, total: Number(count!.n) };
}

/** Everyone who has done something in the log, by name. */
export async function findAuditPeople(): Promise<Array<{ id: string; name: string; email: string }>> {
  return database().query<{ id: string; name: string; email: string }>(
    `SELECT u.id, u.name, u.email FROM users u
      WHERE EXISTS (SELECT 1 FROM audit_log a WHERE a.actor_id = u.id)
      ORDER BY u.role = 'customer', lower(COALESCE(NULLIF(u.name, ''), u.email))`,
    { type: QueryTypes.SELECT },
  );
}
