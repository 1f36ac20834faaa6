import type { AppContext } from '../../app-context';
import { MAX_SAVED_SEARCHES, filtersOfSearch, type SavedSearchParsed } from '../../../shared/schemas/saved-searches';
import type { SavedSearchView } from '../../../shared/types/saved-searches';
import { conflict, notFound } from '../../http/errors';
import { lockUser } from '../users/user.repository';
import { SavedSearch } from './saved-search.entity';

const present = (s: SavedSearch): SavedSearchView => ({
  id: s.id,
  name: s.name,
  query: s.query,
  createdAt: s.createdAt.toISOString(),
  lastNotifiedAt: s.lastNotifiedAt?.toISOString() ?? null,
});

/** The member's saved searches, newest first. */
export async function listSavedSearches(ctx: AppContext, ownerId: number): Promise<SavedSearchView[]> {
  const rows = await ctx.dataSource.getRepository(SavedSearch).find({
    where: { ownerId },
    order: { createdAt: 'DESC', id: 'DESC' },
    take: MAX_SAVED_SEARCHES,
  });
  return rows.map(present);
}

/** Keep a search under a name. The member's row is locked while counting, so two saves cannot pass the limit. */
export async function createSavedSearch(
  ctx: AppContext,
  ownerId: number,
  body: SavedSearchParsed,
): Promise<SavedSearchView> {
  return ctx.transaction(async (m) => {
    await lockUser(m, ownerId);
    if ((await m.countBy(SavedSearch, { ownerId })) >= MAX_SAVED_SEARCHES)
      throw conflict(
        'saved_search_limit',
        `You have ${MAX_SAVED_SEARCHES} saved searches, the most an account can keep. Delete one first.`,
      );
    const saved = await m.save(m.create(SavedSearch, { ownerId, name: body.name, query: filtersOfSearch(body.query) }));
    return present(await m.findOneByOrFail(SavedSearch, { id: saved.id }));
  });
}

/** Delete one of the member's saved searches; another member's answers 404 like a missing one. */
export async function deleteSavedSearch(ctx: AppContext, ownerId: number, id: number): Promise<void> {
  const result = await ctx.dataSource.getRepository(SavedSearch).delete({ id, ownerId });
  if (!result.affected) throw notFound('That saved search');
}
