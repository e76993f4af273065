import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { counterSettings, saveCounterSettings } from '../services/counter/settings.js';

/** /api/counter: the owner's settings for the counter (no-show grace, undo time); the counter reads them. */
export const counterRouter = Router();

route(counterRouter, api.getCounterSettings, [requireRole('counter')], () => counterSettings());

route(counterRouter, api.saveCounterSettings, [requireRole('owner')], ({ req, body }) => saveCounterSettings(currentUser(req).id, body));
