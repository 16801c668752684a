import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AuthService } from './auth-service';

/** A passport instance of this app's own (not the global one), with the e-mail + password strategy. */
export function createPassport(auth: AuthService): InstanceType<typeof Passport> {
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', session: true }, (email, password, done) => {
      auth
        .verifyCredentials(email, password)
        .then((user) => done(null, user ?? false))
        .catch(done);
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: number, done) => {
    auth
      .findActiveUser(id)
      .then((user) => done(null, user ?? false))
      .catch(done);
  });
  return passport;
}
