import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { equipmentCapacity, getProductionSettings, listFormulaVersions, saveFormula, saveProductionSettings } from '../services/production/production.js';

/** /api/production: the kitchen's settings, what its equipment can make, and the dough formula's versions. */
export const productionRouter = Router();

route(productionRouter, api.getProductionSettings, [requireRole('baker')], () => getProductionSettings());

route(productionRouter, api.saveProductionSettings, [requireRole('owner')], ({ req, body }) => saveProductionSettings(currentUser(req).id, body));

route(productionRouter, api.getEquipmentCapacity, [requireRole('baker')], () => equipmentCapacity());

route(productionRouter, api.listFormulas, [requireRole('baker')], () => listFormulaVersions());

route(productionRouter, api.saveFormula, [requireRole('baker')], ({ req, body }) => saveFormula(currentUser(req).id, body.formula, body.note));
