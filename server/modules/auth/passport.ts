import argon2 from 'argon2';
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { CurrentUser, Role } from '../../../shared/schemas/auth';
import { findSignedInUser, findUserByEmail, markSignedIn } from '../users/repository';

// A hash to verify against when the e-mail is unknown, so that the answer takes the same time.
let dummyHash: Promise<string> | null = null;

export function configurePassport() {
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const user = await findUserByEmail(email.trim().toLowerCase());
        if (!user?.passwordHash || !user.active) {
          dummyHash ??= argon2.hash('not-a-real-password-0');
          await argon2.verify(await dummyHash, password).catch(() => false);
          return done(null, false);
        }
        const ok = await argon2.verify(user.passwordHash, password);
        if (!ok) return done(null, false);
        await markSignedIn(user.id);
        return done(null, { id: user.id });
      } catch (err) {
        return done(err);
      }
    }),
  );
  passport.serializeUser((user, done) => done(null, (user as { id: number }).id));
  passport.deserializeUser(async (id: number, done) => {
    try {
      const u = await findSignedInUser(id);
      if (!u?.active) return done(null, false);
      const current: CurrentUser = {
        id: u.id,
        organisationId: u.organisationId,
        organisationName: u.organisationName,
        email: u.email,
        name: u.name,
        roles: u.roles as Role[],
      };
      done(null, current);
    } catch (err) {
      done(err);
    }
  });
}
