import type { RequestHandler } from 'express';
import multer from 'multer';
import { MENU_PHOTO_FIELD, MENU_PHOTO_MAX_BYTES, SHOP_LOGO_FIELD } from '@fryline/schemas';
import { AppError } from '../lib/app-error.js';

const megabytes = MENU_PHOTO_MAX_BYTES / (1024 * 1024);

/**
 * Reads one image from the multipart field `field`, held in memory (at most
 * 8 MB, one file) to be checked and resized before anything is stored;
 * multer's errors become our error body. `what` names the image in messages.
 */
function imageUpload(field: string, what: string): RequestHandler {
  const single = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: MENU_PHOTO_MAX_BYTES, files: 1, fields: 5, fieldSize: 10_000, parts: 6 },
  }).single(field);
  return (req, res, next) => {
    if (!req.is('multipart/form-data')) {
      next(new AppError('not_multipart', `Send the ${what} as multipart/form-data in the field "${field}"`, 400));
      return;
    }
    single(req, res, (err: unknown) => {
      if (!err) {
        if (!req.file) {
          next(new AppError('no_photo', `No ${what} came with the request: put it in the field "${field}"`, 400, { fields: { [field]: `Choose a ${what}` } }));
          return;
        }
        next();
        return;
      }
      // the client may still be sending: close the connection after answering
      res.set('Connection', 'close');
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE') {
          next(new AppError('too_large', `This ${what} is larger than ${megabytes} MB. Choose a smaller one, or save it at a lower quality first.`, 413));
        } else if (err.code === 'LIMIT_UNEXPECTED_FILE') {
          next(new AppError('wrong_field', `The ${what} must come in the field "${field}" (got "${err.field ?? ''}")`, 400));
        } else {
          next(new AppError('bad_upload', `The upload could not be read: ${err.message}`, 400));
        }
        return;
      }
      next(new AppError('bad_upload', 'The upload could not be read. Try again.', 400));
    });
  };
}

/** A menu item's photo, in field `photo`. */
export const photoUpload = imageUpload(MENU_PHOTO_FIELD, 'photo');

/** The shop's logo, in field `logo`. */
export const logoUpload = imageUpload(SHOP_LOGO_FIELD, 'logo');
