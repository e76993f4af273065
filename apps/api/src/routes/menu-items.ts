import { Router } from 'express';
import { api } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { photoUpload } from '../middleware/photo-upload.js';
import { route } from '../lib/route.js';
import { createMenuItem, getMenuItem, listMenuItems, removePhoto, setArchived, setPhoto, updateMenuItem } from '../services/menu/menu-items.js';

/** /api/staff/menu-items: the shop's menu as the staff manage it (the owner changes it, bakers read it). */
export const menuItemsRouter = Router();

const owner = [requireRole('owner')];

route(menuItemsRouter, api.listMenuItems, [requireRole('baker')], () => listMenuItems(), { noStore: true });

route(menuItemsRouter, api.getMenuItem, [requireRole('baker')], ({ params }) => getMenuItem(params.id), { noStore: true });

route(menuItemsRouter, api.createMenuItem, owner, ({ req, body }) => createMenuItem(currentUser(req), body));

route(menuItemsRouter, api.updateMenuItem, owner, ({ req, params, body }) => updateMenuItem(currentUser(req), params.id, body));

route(menuItemsRouter, api.archiveMenuItem, owner, ({ req, params, now }) => setArchived(currentUser(req), params.id, true, now));

route(menuItemsRouter, api.restoreMenuItem, owner, ({ req, params, now }) => setArchived(currentUser(req), params.id, false, now));

// the owner's role is checked before a byte of the upload is read
route(menuItemsRouter, api.uploadMenuPhoto, [...owner, photoUpload], ({ req, params }) => setPhoto(currentUser(req), params.id, req.file!.buffer));

route(menuItemsRouter, api.removeMenuPhoto, owner, ({ req, params }) => removePhoto(currentUser(req), params.id));
