import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import {
  listingPhotoParamSchema,
  photoOrderSchema,
  type ListingPhotoParam,
  type PhotoOrderInput,
} from '../../../shared/schemas/listing-photos';
import { listingIdParamSchema, type ListingIdParam } from '../../../shared/schemas/listings';
import { listingActorOf, viewerOf } from '../listings/listing-actor';
import { addListingPhoto, checkPhotoUpload, listPhotos } from './listing-photos.service';
import { chooseCover, deletePhoto, reorderPhotos } from './photo-arrangement.service';
import { receivePhoto } from './photo-upload';

const idParam = validate(listingIdParamSchema, 'params');
const photoParams = validate(listingPhotoParamSchema, 'params');
const idOf = (res: Parameters<typeof input>[0]) => input<ListingIdParam>(res, 'params').id;
const photoOf = (res: Parameters<typeof input>[0]) => input<ListingPhotoParam>(res, 'params');

/**
 * A listing's photos, under /api/listings/:id/photos. Anyone who may see the listing lists them; only its seller
 * uploads (one file per request), reorders, chooses the cover and deletes.
 */
export function listingPhotosRouter(ctx: AppContext): Router {
  const router = Router();

  router.get('/:id/photos', idParam, async (req, res) => {
    res.json({ photos: await listPhotos(ctx, viewerOf(req), idOf(res)) });
  });

  router.post(
    '/:id/photos',
    requireSignedIn,
    idParam,
    async (req, res, next) => {
      await checkPhotoUpload(ctx, listingActorOf(req), idOf(res));
      next();
    },
    receivePhoto,
    async (req, res) => {
      res.status(201).json(await addListingPhoto(ctx, listingActorOf(req), idOf(res), req.file!.buffer));
    },
  );

  router.put('/:id/photos/order', requireSignedIn, idParam, validate(photoOrderSchema), async (req, res) => {
    res.json({ photos: await reorderPhotos(ctx, listingActorOf(req), idOf(res), input<PhotoOrderInput>(res)) });
  });

  router.post('/:id/photos/:photoId/cover', requireSignedIn, photoParams, async (req, res) => {
    const { id, photoId } = photoOf(res);
    res.json({ photos: await chooseCover(ctx, listingActorOf(req), id, photoId) });
  });

  router.delete('/:id/photos/:photoId', requireSignedIn, photoParams, async (req, res) => {
    const { id, photoId } = photoOf(res);
    res.json({ photos: await deletePhoto(ctx, listingActorOf(req), id, photoId) });
  });

  return router;
}
