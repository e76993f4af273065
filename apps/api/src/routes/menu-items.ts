import { Router } from 'express';
import { z } from 'zod';
import { menuItemInputSchema, menuItemPatchSchema, type MenuItemInput, type MenuItemPatch } from '@fryline/schemas';
import { currentUser, requireRole } from '../middleware/auth.js';
import { validate, valid } from '../middleware/validate.js';
import { photoUpload } from '../middleware/photo-upload.js';
import { AppError } from '../lib/app-error.js';
import { findPhotoFile } from '../db/queries/menu-photos.js';
import { createMenuItem, listMenuItems, removePhoto, setArchived, setPhoto, updateMenuItem, getMenuItem } from '../services/menu/menu-items.js';

export const menuItemsRouter = Router();
const idParams = z.object({ id: z.uuid('Unknown menu item') });
const id = (res: Parameters<typeof valid>[0]) => valid<{ id: string }>(res, 'params').id;

// the bakers read the menu too (the production sheet, the bake-day form)
menuItemsRouter.get('/api/staff/menu-items', requireRole('baker'), async (_req, res) => {
  res.set('Cache-Control', 'no-store').json(await listMenuItems());
});

menuItemsRouter.get('/api/staff/menu-items/:id', requireRole('baker'), validate('params', idParams), async (_req, res) => {
  res.set('Cache-Control', 'no-store').json(await getMenuItem(id(res)));
});

menuItemsRouter.post('/api/staff/menu-items', requireRole('owner'), validate('body', menuItemInputSchema), async (req, res) => {
  res.status(201).json(await createMenuItem(currentUser(req), valid<MenuItemInput>(res, 'body')));
});

menuItemsRouter.patch('/api/staff/menu-items/:id', requireRole('owner'), validate('params', idParams), validate('body', menuItemPatchSchema), async (req, res) => {
  res.json(await updateMenuItem(currentUser(req), id(res), valid<MenuItemPatch>(res, 'body')));
});

menuItemsRouter.post('/api/staff/menu-items/:id/archive', requireRole('owner'), validate('params', idParams), async (req, res) => {
  res.json(await setArchived(currentUser(req), id(res), true, new Date()));
});

menuItemsRouter.post('/api/staff/menu-items/:id/restore', requireRole('owner'), validate('params', idParams), async (req, res) => {
  res.json(await setArchived(currentUser(req), id(res), false, new Date()));
});

menuItemsRouter.post('/api/staff/menu-items/:id/photo', requireRole('owner'), validate('params', idParams), photoUpload, async (req, res) => {
  res.status(201).json(await setPhoto(currentUser(req), id(res), req.file!.buffer));
});

menuItemsRouter.delete('/api/staff/menu-items/:id/photo', requireRole('owner'), validate('params', idParams), async (req, res) => {
  await removePhoto(currentUser(req), id(res));
  res.status(204).end();
});

/** Photo files: the name is the hash of the bytes, so a file never changes and may be cached for a year. */
menuItemsRouter.get('/api/photos/:file', async (req, res) => {
  const match = /^([0-9a-f]{32})\.webp$/.exec(req.params.file);
  if (!match) throw new AppError('not_found', 'No such photo', 404);
  const file = await findPhotoFile(match[1]!);
  if (!file) throw new AppError('not_found', 'No such photo', 404);
  const etag = `"${match[1]}"`;
  res.set({ 'Cache-Control': 'public, max-age=31536000, immutable', ETag: etag, 'Content-Type': file.contentType });
  if (req.get('if-none-match') === etag) {
    res.status(304).end();
    return;
  }
  res.send(file.bytes);
});
