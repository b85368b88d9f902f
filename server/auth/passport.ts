// passport-local checks e-mail and password; the session keeps only the user id.
import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { User } from '../models';
import { signedInUser } from './signed-in-user';
import { checkPassword } from '../services/accounts';

export type SignInFailure = 'wrong' | 'unverified' | 'disabled';

export function configurePassport(): passport.PassportStatic {
  const instance = new passport.Passport();
  instance.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      checkPassword(email, password)
        .then((result) => ('user' in result ? done(null, result.user) : done(null, false, { message: result.failure })))
        .catch(done);
    }),
  );
  instance.serializeUser((user, done) => done(null, (user as User).id));
  instance.deserializeUser((id: number, done) => {
    signedInUser(id)
      // A disabled account loses its sessions at once.
      .then((user) => done(null, user && !user.disabledAt ? user : false))
      .catch(done);
  });
  return instance as unknown as passport.PassportStatic;
}
