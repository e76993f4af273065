import { Router } from 'express';
import { auditQuerySchema, type AuditQuery } from '@fryline/schemas';
import { requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { listAuditLog } from '../services/audit-log/audit-log.js';

export const auditLogRouter = Router();

auditLogRouter.get('/api/staff/audit-log', requireRole('owner'), validate('query', auditQuerySchema), async (_req, res) => {
  res.set('Cache-Control', 'no-store').json(await listAuditLog(valid<AuditQuery>(res, 'query')));
});
