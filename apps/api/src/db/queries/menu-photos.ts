import { QueryTypes, type Transaction } from 'sequelize';
import { database } from '../sequelize.js';

// Menu photos live in PostgreSQL (bytea), so the database backup holds them.

export interface PhotoFileInput {
  width: number;
  height: number;
  hash: string;
  contentType: string;
  bytes: Buffer;
}

export interface StoredPhoto {
  id: string;
  width: number;
  height: number;
  files: Array<{ width: number; height: number; hash: string }>;
}

export async function insertPhoto(
  photo: { width: number; height: number; uploadedBy: string | null },
  files: PhotoFileInput[],
  transaction: Transaction,
): Promise<string> {
  const [row] = await database().query<{ id: string }>(
    `INSERT INTO menu_photos (width, height, uploaded_by) VALUES (:width, :height, :uploadedBy) RETURNING id`,
    { replacements: photo, type: QueryTypes.SELECT, transaction },
  );
  for (const file of files) {
    await database().query(
      `INSERT INTO menu_photo_files (photo_id, width, height, hash, content_type, bytes)
       VALUES (:photoId, :width, :height, :hash, :contentType, :bytes)`,
      { replacements: { ...file, photoId: row!.id }, transaction },
    );
  }
  return row!.id;
}

export async function deletePhoto(id: string, transaction: Transaction): Promise<void> {
  await database().query(`DELETE FROM menu_photos WHERE id = :id`, { replacements: { id }, transaction });
}

/** The stored sizes of each photo, smallest first (bytes left out). */
export async function findPhotos(ids: readonly string[], transaction?: Transaction): Promise<Map<string, StoredPhoto>> {
  const wanted = [...new Set(ids)];
  const out = new Map<string, StoredPhoto>();
  if (wanted.length === 0) return out;
  const rows = await database().query<{ id: string; pw: number; ph: number; width: number; height: number; hash: string }>(
    `SELECT p.id, p.width AS pw, p.height AS ph, f.width, f.height, f.hash
       FROM menu_photos p JOIN menu_photo_files f ON f.photo_id = p.id
      WHERE p.id IN (:ids)
      ORDER BY p.id, f.width`,
    { replacements: { ids: wanted }, type: QueryTypes.SELECT, transaction },
  );
  for (const r of rows) {
    const photo = out.get(r.id) ?? { id: r.id, width: r.pw, height: r.ph, files: [] };
    photo.files.push({ width: r.width, height: r.height, hash: r.hash });
    out.set(r.id, photo);
  }
  return out;
}

/** One stored file by the hash in its URL. */
export async function findPhotoFile(hash: string): Promise<{ bytes: Buffer; contentType: string } | null> {
  const [row] = await database().query<{ bytes: Buffer; content_type: string }>(
    `SELECT bytes, content_type FROM menu_photo_files WHERE hash = :hash LIMIT 1`,
    { replacements: { hash }, type: QueryTypes.SELECT },
  );
  return row ? { bytes: row.bytes, contentType: row.content_type } : null;
}

/** How many rows the photo tables hold (tests check nothing was stored). */
export async function countPhotoRows(): Promise<{ photos: number; files: number }> {
  const [row] = await database().query<{ photos: number; files: number }>(
    `SELECT (SELECT count(*) FROM menu_photos) AS photos, (SELECT count(*) FROM menu_photo_files) AS files`,
    { type: QueryTypes.SELECT },
  );
  return row!;
}
