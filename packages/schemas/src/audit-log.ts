import { z } from 'zod';

// The owner's audit log: who changed what, and when.

/** What the log can be filtered by; the database works each entry's kind out from its action. */
export const auditKinds = [
  'capacity', 'prices', 'menu', 'refunds', 'roles', 'pickups', 'call-offs', 'settings', 'bake-days', 'production', 'orders',
  'accounts', 'other',
] as const;
export type AuditKind = (typeof auditKinds)[number];

export const auditKindLabels: Record<AuditKind, string> = {
  capacity: 'Capacity',
  prices: 'Prices',
  menu: 'Menu',
  refunds: 'Refunds',
  roles: 'Staff roles',
  pickups: 'Pickups',
  'call-offs': 'Called-off bake days',
  settings: 'Shop settings',
  'bake-days': 'Bake days',
  production: 'Production',
  orders: 'Orders',
  accounts: 'Accounts',
  other: 'Other',
};

const day = z.iso.date({ error: 'Use a date like 2025-06-14' });

export const auditQuerySchema = z
  .strictObject({
    kind: z.enum(auditKinds, { error: 'Unknown kind of change' }).optional(),
    actorId: z.uuid('Unknown person').optional(),
    /** First day shown, in the shop's time zone. */
    from: day.optional(),
    /** Last day shown (inclusive), in the shop's time zone. */
    to: day.optional(),
    page: z.coerce.number().int().min(1).max(10_000).default(1),
    pageSize: z.coerce.number().int().min(5).max(200).default(50),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'The first day must come before the last', path: ['to'] });
export type AuditQuery = z.infer<typeof auditQuerySchema>;

const personSchema = z.object({ id: z.string(), name: z.string(), email: z.string() });

export const auditEntryViewSchema = z.object({
  id: z.number().int(),
  at: z.string(),
  kind: z.enum(auditKinds),
  action: z.string(),
  /** One line a person can read: "Gave Kit Marrow the counter role". */
  summary: z.string(),
  actor: personSchema.nullable(),
  subjectType: z.string(),
  subjectId: z.string().nullable(),
  details: z.record(z.string(), z.unknown()),
});
export type AuditEntryView = z.infer<typeof auditEntryViewSchema>;

export const auditPageSchema = z.object({
  entries: z.array(auditEntryViewSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
  /** The shop's time zone, in which `from` and `to` are read. */
  timeZone: z.string(),
  /** Everyone who appears in the log, for the person filter. */
  people: z.array(personSchema),
});
export type AuditPage = z.infer<typeof auditPageSchema>;
