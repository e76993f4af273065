import { Router } from 'express';
import { z } from 'zod';
import { capacityOverrideSchema, productionSettingsSchema, saveFormulaSchema } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import {
  equipmentCapacity, getProductionSettings, listFormulaVersions, pinFormula, planForBakeDay, saveFormula, saveProductionSettings, setBakeDayCapacity,
} from '../services/production/production.js';

export const productionRouter = Router();
const dayParams = z.object({ id: z.uuid('Unknown bake day') });
const dayId = (res: Parameters<typeof valid>[0]) => valid<{ id: string }>(res, 'params').id;

productionRouter.get('/api/bake-days/:id/plan', requireRole('baker'), validate('params', dayParams), async (_req, res) => {
  res.set('Cache-Control', 'no-store').json(await planForBakeDay(dayId(res), new Date()));
});

productionRouter.post('/api/bake-days/:id/formula', requireRole('baker'), validate('params', dayParams), validate('body', z.strictObject({ formulaVersionId: z.uuid() })), async (req, res) => {
  await pinFormula(currentUser(req).id, dayId(res), valid<{ formulaVersionId: string }>(res, 'body').formulaVersionId);
  res.json(await planForBakeDay(dayId(res), new Date()));
});

productionRouter.post('/api/bake-days/:id/capacity', requireRole('owner'), validate('params', dayParams), validate('body', capacityOverrideSchema), async (req, res) => {
  const body = valid<z.infer<typeof capacityOverrideSchema>>(res, 'body');
  res.json(await setBakeDayCapacity(currentUser(req).id, dayId(res), body.rings, body.holes, body.acceptAboveEquipment));
});

productionRouter.get('/api/production/settings', requireRole('baker'), async (_req, res) => {
  res.json(await getProductionSettings());
});

productionRouter.put('/api/production/settings', requireRole('owner'), validate('body', productionSettingsSchema), async (req, res) => {
  res.json(await saveProductionSettings(currentUser(req).id, valid(res, 'body')));
});

productionRouter.get('/api/production/capacity', requireRole('baker'), async (_req, res) => {
  res.json(await equipmentCapacity());
});

productionRouter.get('/api/production/formulas', requireRole('baker'), async (_req, res) => {
  res.json(await listFormulaVersions());
});

productionRouter.post('/api/production/formulas', requireRole('baker'), validate('body', saveFormulaSchema), async (req, res) => {
  const body = valid<z.infer<typeof saveFormulaSchema>>(res, 'body');
  res.status(201).json(await saveFormula(currentUser(req).id, body.formula, body.note));
});
