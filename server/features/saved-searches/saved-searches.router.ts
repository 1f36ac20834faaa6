import { Router } from 'express';
import type { AppContext } from '../../app-context';
import { requireSignedIn } from '../../http/middlewares/require-role';
import { input, validate } from '../../http/middlewares/validate';
import {
  savedSearchIdParamSchema,
  savedSearchInputSchema,
  type SavedSearchParsed,
} from '../../../shared/schemas/saved-searches';
import * as savedSearches from './saved-searches.service';

/** A member's saved searches; each e-mails them when a newly listed listing matches. */
export function savedSearchesRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requireSignedIn);

  router.get('/', async (req, res) => {
    res.json({ items: await savedSearches.listSavedSearches(ctx, req.user!.id) });
  });

  router.post('/', validate(savedSearchInputSchema), async (req, res) => {
    const search = await savedSearches.createSavedSearch(ctx, req.user!.id, input<SavedSearchParsed>(res));
    res.status(201).json({ search });
  });

  router.delete('/:id', validate(savedSearchIdParamSchema, 'params'), async (req, res) => {
    await savedSearches.deleteSavedSearch(ctx, req.user!.id, input<{ id: number }>(res, 'params').id);
    res.status(204).end();
  });

  return router;
}
