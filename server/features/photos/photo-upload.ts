import type { RequestHandler } from 'express';
import multer from 'multer';
import { PHOTO_LIMITS } from '../../../shared/listings/photo-limits';
import type { AppError } from '../../http/errors';
import { photoErrors } from './photo-errors';

/** The form field that carries the photo. */
export const PHOTO_FIELD = 'photo';

/**
 * Read one photo into memory, at most 10 MB, with no other fields or files (OWASP File Upload Cheat Sheet: set a
 * file size limit; limit the number of files). Nothing touches the disk, and the file's name and declared type
 * are ignored from here on. Multer's errors become answers in the one error shape.
 */
const single = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: PHOTO_LIMITS.maxBytes, files: 1, fields: 0, parts: 1 },
}).single(PHOTO_FIELD);

function uploadError(error: unknown): AppError {
  if (error instanceof multer.MulterError)
    return error.code === 'LIMIT_FILE_SIZE' ? photoErrors.tooLarge() : photoErrors.oneFile();
  return photoErrors.malformed();
}

/** Parse the multipart body; 400 when no photo arrived. */
export const receivePhoto: RequestHandler = (req, res, next) => {
  single(req, res, (error: unknown) => {
    if (error) return next(uploadError(error));
    if (!req.file) return next(photoErrors.missing());
    next();
  });
};
