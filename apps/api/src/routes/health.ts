import { Router } from 'express';
import { api, type ResponseOf } from '@fryline/schemas';
import { database } from '../db/sequelize.js';

export const healthRouter = Router();

healthRouter.get(api.health.path, async (_req, res) => {
  try {
    await Promise.race([
      database().query('SELECT 1'),
      new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 2_000).unref()),
    ]);
    const up: ResponseOf<typeof api.health> = { ok: true, db: 'up' };
    res.json(up);
  } catch {
    res.status(503).json({ ok: false, db: 'down' });
  }
});
