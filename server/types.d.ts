import type { User as UserEntity } from './features/users/user.entity';

declare global {
  namespace Express {
    /** The signed-in account, as passport puts it on `req.user`. */
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type -- merges the entity into passport's type
    interface User extends UserEntity {}
  }
}

declare module 'express-session' {
  interface SessionData {
    /** When this session signed in (ms), for the absolute time-out. */
    signedInAt?: number;
    /** Last request (ms), for the idle time-out. */
    lastSeenAt?: number;
  }
}

export {};
