import type { Request } from 'express';
import type { Role } from '../../../shared/roles';
import { clientIp } from '../../http/request-helpers';

/** The signed-in person acting on listings: who, with which role, from where (for the audit log). */
export interface ListingActor {
  id: number;
  role: Role;
  ip: string;
}

/** The actor of a request that passed `requireSignedIn` or `requireRole`. */
export const listingActorOf = (req: Request): ListingActor => ({
  id: req.user!.id,
  role: req.user!.role,
  ip: clientIp(req),
});

/** The viewer of a public route: an actor, or null for a visitor. */
export const viewerOf = (req: Request): ListingActor | null => (req.user ? listingActorOf(req) : null);
