import { LISTING_LIMITS } from '@shared/listings/limits';

/** A buyer's own end profile, kept in this browser so "joins my profile" works on every visit. */
export interface JoinProfile {
  /** Each track's offset from the front edge, mm, smallest first. */
  offsetsMm: number[];
  toleranceMm: number;
}

export const JOIN_PROFILE_KEY = 'bw-join-profile';
export const DEFAULT_TOLERANCE_MM = 5;

function isProfile(value: unknown): value is JoinProfile {
  if (typeof value !== 'object' || value === null) return false;
  const { offsetsMm, toleranceMm } = value as Partial<JoinProfile>;
  return (
    Array.isArray(offsetsMm) &&
    offsetsMm.length > 0 &&
    offsetsMm.length <= LISTING_LIMITS.tracksPerEnd &&
    offsetsMm.every((o) => Number.isInteger(o) && o >= 0 && o <= LISTING_LIMITS.widthMm.max) &&
    Number.isInteger(toleranceMm) &&
    toleranceMm! >= 0 &&
    toleranceMm! <= LISTING_LIMITS.profileToleranceMmMax
  );
}

/** The saved profile, or null when there is none (or storage is blocked). */
export function loadJoinProfile(): JoinProfile | null {
  try {
    const value = JSON.parse(localStorage.getItem(JOIN_PROFILE_KEY) ?? 'null') as unknown;
    return isProfile(value) ? value : null;
  } catch {
    return null;
  }
}

export function saveJoinProfile(profile: JoinProfile): void {
  try {
    localStorage.setItem(JOIN_PROFILE_KEY, JSON.stringify(profile));
  } catch {
    // Storage blocked: the profile still applies to this search through the address bar.
  }
}
