import { PHOTO_MESSAGES } from '../../../shared/listings/photo-limits';
import { AppError, badRequest, conflict } from '../../http/errors';

/** The answers to a refused upload, in the one error shape; the words are shared with the client. */
export const photoErrors = {
  tooLarge: () => new AppError(413, 'photo_too_large', PHOTO_MESSAGES.tooLarge),
  wrongType: () => new AppError(415, 'photo_type', PHOTO_MESSAGES.wrongType),
  unreadable: () => new AppError(422, 'photo_unreadable', PHOTO_MESSAGES.unreadable),
  limit: () => conflict('photo_limit', PHOTO_MESSAGES.limit),
  missing: () => badRequest('photo_missing', PHOTO_MESSAGES.missing),
  oneFile: () => badRequest('photo_upload_shape', PHOTO_MESSAGES.oneFile),
  malformed: () => badRequest('photo_upload_malformed', 'The upload arrived incomplete. Try again.'),
  /** Storage could not be reached; the client may retry after a short wait. */
  storageDown: () => new AppError(503, 'storage_unavailable', PHOTO_MESSAGES.storageDown, undefined, 30),
  /** Storage could not be read while serving a photo. */
  storageUnreadable: () => new AppError(503, 'storage_unavailable', PHOTO_MESSAGES.storageUnreadable, undefined, 30),
  notFound: () => new AppError(404, 'not_found', 'That photo was not found.'),
};
