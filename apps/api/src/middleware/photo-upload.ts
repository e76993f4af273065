import type { RequestHandler } from 'express';
import multer from 'multer';
import { MENU_PHOTO_FIELD, MENU_PHOTO_MAX_BYTES } from '@fryline/schemas';
import { AppError } from '../lib/app-error.js';

const megabytes = MENU_PHOTO_MAX_BYTES / (1024 * 1024);

// Held in memory (at most 8 MB, one file), checked and resized before anything is stored.
const single = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MENU_PHOTO_MAX_BYTES, files: 1, fields: 5, fieldSize: 10_000, parts: 6 },
}).single(MENU_PHOTO_FIELD);

/** Reads one photo from multipart field `photo`; multer's errors become our error body. */
export const photoUpload: RequestHandler = (req, res, next) => {
  if (!req.is('multipart/form-data')) {
    next(new AppError('not_multipart', `Send the photo as multipart/form-data in the field "${MENU_PHOTO_FIELD}"`, 400));
    return;
  }
  single(req, res, (err: unknown) => {
    if (!err) {
      if (!req.file) {
        next(new AppError('no_photo', `No photo came with the request: put it in the field "${MENU_PHOTO_FIELD}"`, 400, { fields: { [MENU_PHOTO_FIELD]: 'Choose a photo' } }));
        return;
      }
      next();
      return;
    }
    // the client may still be sending: close the connection after answering
    res.set('Connection', 'close');
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE') {
        next(new AppError('too_large', `This photo is larger than ${megabytes} MB. Choose a smaller one, or save it at a lower quality first.`, 413));
      } else if (err.code === 'LIMIT_UNEXPECTED_FILE') {
        next(new AppError('wrong_field', `The photo must come in the field "${MENU_PHOTO_FIELD}" (got "${err.field ?? ''}")`, 400));
      } else {
        next(new AppError('bad_upload', `The upload could not be read: ${err.message}`, 400));
      }
      return;
    }
    next(new AppError('bad_upload', 'The upload could not be read. Try again.', 400));
  });
};
