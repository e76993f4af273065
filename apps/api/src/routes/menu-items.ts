import { Router } from 'express';
import { api } from '@fryline/schemas';
import { requireRole } from '../middleware/auth.js';
import { route } from '../lib/route.js';
import { listMenuItems } from '../services/menu/menu-items.js';

/** /api/staff/menu-items: the shop's menu as the staff manage it. */
export const menuItemsRouter = Router();

route(menuItemsRouter, api.listMenuItems, [requireRole('baker')], () => listMenuItems());
