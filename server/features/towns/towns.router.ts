import { Router } from 'express';
import { input, validate } from '../../http/middlewares/validate';
import { townSearchSchema, type TownSearchQuery } from '../../../shared/schemas/towns';
import { gazetteer, presentTown } from './gazetteer';

/** Town autocomplete for listing and search forms: open to everyone, as the gazetteer is public data. */
export function townsRouter(): Router {
  const router = Router();
  router.get('/', validate(townSearchSchema, 'query'), async (_req, res) => {
    const { q, country } = input<TownSearchQuery>(res, 'query');
    const towns = (await gazetteer()).search(q, 10, country);
    res.json({ items: towns.map(presentTown) });
  });
  return router;
}
