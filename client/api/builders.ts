import type { BuilderApplicationInput, BuilderProfileListQuery } from '@shared/schemas/builders';
import type { BuilderProfileView } from '@shared/types/listings';
import type { Page } from '@shared/types/user';
import { isApiError } from './errors';
import { http } from './http';

type ProfileAnswer = Promise<{ profile: BuilderProfileView }>;

/** Apply for a builder profile (or apply again after a decline). */
export function applyForBuilderProfile(input: BuilderApplicationInput): ProfileAnswer {
  return http.post('/api/builder-profiles', input);
}

/** The signed-in member's own application, or null when they have never applied. */
export async function myBuilderProfile(): Promise<BuilderProfileView | null> {
  try {
    const { profile } = await http.get<{ profile: BuilderProfileView }>('/api/builder-profiles/mine');
    return profile;
  } catch (error) {
    if (isApiError(error) && error.status === 404) return null;
    throw error;
  }
}

/** Applications in one state, oldest first (moderators). */
export function listBuilderProfiles(query: Partial<BuilderProfileListQuery>): Promise<Page<BuilderProfileView>> {
  return http.get<Page<BuilderProfileView>>('/api/builder-profiles', { ...query });
}

/** The member becomes a builder. */
export function approveBuilderProfile(id: number): ProfileAnswer {
  return http.post(`/api/builder-profiles/${id}/approve`);
}

/** Decline with a reason the member is e-mailed. */
export function declineBuilderProfile(id: number, reason: string): ProfileAnswer {
  return http.post(`/api/builder-profiles/${id}/decline`, { reason });
}
