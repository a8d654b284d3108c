import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { findUserById, checkCredentials, type AuthDeps } from './auth.service';

/** A Passport instance per app (tests build several apps), with the local e-mail + password strategy. */
export function createPassport(deps: AuthDeps) {
  const passport = new Passport();
  passport.use(
    new LocalStrategy(
      { usernameField: 'email', passwordField: 'password', session: true },
      (email, password, done) => {
        checkCredentials(deps, email, password).then(
          (user) => done(null, user),
          (err: unknown) => done(err),
        );
      },
    ),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: number, done) => {
    findUserById(id).then(
      (user) => done(null, user ?? false),
      (err: unknown) => done(err),
    );
  });
  return passport;
}
