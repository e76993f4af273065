import { Router } from 'express';
import { api } from '@fryline/schemas';
import { requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { listAuditLog } from '../services/audit-log/audit-log.js';

/** /api/staff/audit-log: who changed what, and when. */
export const auditLogRouter = Router();

route(auditLogRouter, api.listAuditLog, [requireRole('owner')], ({ query }) => listAuditLog(query), { noStore: true });
