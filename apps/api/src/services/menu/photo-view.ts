import type { MenuPhotoView } from '@fryline/schemas';
import { findPhotos, type StoredPhoto } from '../../db/queries/menu-photos.js';

/** Where a stored photo file is served; the hash of its bytes makes the URL change whenever the file does. */
export const photoFileUrl = (hash: string) => `/api/photos/${hash}.webp`;

export function toPhotoView(photo: StoredPhoto): MenuPhotoView {
  const files = photo.files.map((f) => ({ width: f.width, height: f.height, url: photoFileUrl(f.hash) }));
  const middle = files[Math.min(1, files.length - 1)]!;
  return {
    id: photo.id,
    width: photo.width,
    height: photo.height,
    src: middle.url,
    srcset: files.map((f) => `${f.url} ${f.width}w`).join(', '),
    urls: files.map((f) => f.url),
    files,
  };
}

/** Photo views for menu items, by photo id (items without a photo are left out). */
export async function photoViewsFor(items: ReadonlyArray<{ photoId: string | null }>): Promise<Map<string, MenuPhotoView>> {
  const stored = await findPhotos(items.flatMap((i) => (i.photoId ? [i.photoId] : [])));
  return new Map([...stored].map(([id, photo]) => [id, toPhotoView(photo)]));
}
