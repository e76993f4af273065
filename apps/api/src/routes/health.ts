import { Router } from 'express';
import { database } from '../db/sequelize.js';

export const healthRouter = Router();

healthRouter.get('/api/health', async (_req, res) => {
  try {
    await Promise.race([
      database().query('SELECT 1'),
      new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 2_000).unref()),
    ]);
    res.json({ ok: true, db: 'up' });
  } catch {
    res.status(503).json({ ok: false, db: 'down' });
  }
});
