import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { loginInput } from '../../shared/schemas/auth';
import { authenticate, findUserById } from '../services/auth';

let configured = false;

export function configurePassport() {
  if (configured) return passport;
  configured = true;
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', passReqToCallback: true }, (req, _email, _password, done) => {
      // The body was already checked by the route with the shared zod schema; parse again to normalise.
      const input = loginInput.parse(req.body);
      authenticate(input, req.ip ?? 'unknown').then(
        (user) => done(null, user ?? false),
        (err) => done(err),
      );
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser((id: string, done) => {
    findUserById(id).then(
      (u) => done(null, u ?? false),
      (err) => done(err),
    );
  });
  return passport;
}
