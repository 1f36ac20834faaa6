import { haversineKm, roundPosition, type LatLon } from '../../../shared/geo';
import { LISTING_LIMITS } from '../../../shared/listings/limits';
import { validationFailed } from '../../http/errors';
import { gazetteer, type Town } from '../towns/gazetteer';

/**
 * The town a listing names, and the approximate position stored for it: the seller's (already rounded) when given
 * and near the town, else the town's own, rounded the same way.
 */
export async function resolveLocation(townId: number, position?: LatLon): Promise<{ town: Town; position: LatLon }> {
  const town = (await gazetteer()).find(townId);
  if (!town) throw validationFailed({ townId: 'Choose the nearest town from the list; this one is not in it.' });
  if (!position) return { town, position: roundPosition(town) };
  const km = haversineKm(town, position);
  if (km > LISTING_LIMITS.positionFromTownKm)
    throw validationFailed({
      position: `This position is ${Math.round(km)} km from ${town.name}. Choose the town nearest to the board, or move the pin within ${LISTING_LIMITS.positionFromTownKm} km of it.`,
    });
  return { town, position };
}
