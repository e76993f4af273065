import { Router } from 'express';
import { AppError } from '../lib/app-error.js';
import { findPhotoFile } from '../db/queries/menu-photos.js';

/**
 * /api/photos/<hash>.webp: menu photo files (binary, so outside the JSON
 * contract). The name is the hash of the bytes, so a file never changes
 * and may be cached for a year.
 */
export const photosRouter = Router();

photosRouter.get('/api/photos/:file', async (req, res) => {
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
