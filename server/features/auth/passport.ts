import passportModule from 'passport';

export type Authenticator = passportModule.Authenticator;
import type { AppContext } from '../../app-context';
import { findUserById } from '../users/user.repository';

/**
 * A passport instance per app. The session keeps "id:epoch"; raising a user's epoch (password
 * change, suspension) ends every session that was signed in before.
 */
export function createPassport(ctx: AppContext): Authenticator {
  const passport = new passportModule.Passport();
  passport.serializeUser<string>((user, done) => done(null, `${user.id}:${user.sessionEpoch}`));
  passport.deserializeUser<string>((key, done) => {
    const [id, epoch] = key.split(':').map(Number);
    findUserById(ctx.dataSource.manager, id ?? 0)
      .then((user) => {
        const current = user && user.sessionEpoch === epoch && user.suspendedAt === null;
        done(null, current ? user : false);
      })
      .catch(done);
  });
  return passport;
}
