import type { BuilderProfileView } from '../../../shared/types/listings';
import { presentTown, type Gazetteer } from '../towns/gazetteer';
import type { BuilderProfile } from './builder-profile.entity';

/** A builder profile as its member and moderators see it. */
export function presentBuilderProfile(p: BuilderProfile, towns: Gazetteer): BuilderProfileView {
  const town = towns.find(p.townId);
  return {
    id: p.id,
    user: { id: p.userId, displayName: p.user?.displayName ?? '' },
    businessName: p.businessName,
    about: p.about,
    town: town
      ? presentTown(town)
      : { id: p.townId, name: 'Unknown town', adminArea: '', country: 'GB', lat: 0, lon: 0 },
    builds: p.builds,
    state: p.state,
    decisionNote: p.decisionNote,
    appliedAt: p.createdAt.toISOString(),
    decidedAt: p.decidedAt?.toISOString() ?? null,
  };
}
