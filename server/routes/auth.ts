import { Router } from 'express';
import passport from 'passport';
import { forgotPasswordInput, loginInput, registerInput, resetPasswordInput, verifyEmailInput } from '../../shared/schemas/auth';
import { publicRoute, requireUser } from '../auth/require-role';
import { unauthenticated } from '../errors';
import { parseBody } from '../lib/validate';
import * as auth from '../services/auth';
import { mergeAnonymousCart } from '../services/cart';
import type { SessionUser } from '../auth/require-role';

export const authRouter = Router();

function logIn(req: Express.Request, user: SessionUser) {
  // passport 0.7 regenerates the session here, so the id changes at sign-in (no fixation).
  return new Promise<void>((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
}

authRouter.post('/register', publicRoute, async (req, res) => {
  const input = parseBody(registerInput, req);
  const user = await auth.register(input);
  await logIn(req, user);
  await mergeAnonymousCart(req, res, user.id);
  res.status(201).json({ user });
});

authRouter.post('/login', publicRoute, async (req, res, next) => {
  parseBody(loginInput, req);
  const user = await new Promise<SessionUser | false>((resolve, reject) =>
    passport.authenticate('local', { session: false }, (err: unknown, u: SessionUser | false) => (err ? reject(err) : resolve(u)))(req, res, next),
  );
  if (!user) throw unauthenticated('E-mail or password is not right');
  await logIn(req, user);
  await mergeAnonymousCart(req, res, user.id);
  res.json({ user });
});

authRouter.post('/logout', publicRoute, async (req, res) => {
  await new Promise<void>((resolve, reject) => req.logout((err) => (err ? reject(err) : resolve())));
  await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
  res.clearCookie('drabyard.sid');
  res.status(204).end();
});

authRouter.get('/me', publicRoute, (req, res) => {
  if (!req.user) throw unauthenticated('Not signed in');
  res.json({ user: req.user });
});

authRouter.post('/verify-email', publicRoute, async (req, res) => {
  const { token } = parseBody(verifyEmailInput, req);
  const user = await auth.verifyEmail(token);
  res.json({ user });
});

authRouter.post('/resend-verification', requireUser, async (req, res) => {
  await auth.resendVerification(req.user!.id);
  res.status(204).end();
});

authRouter.post('/forgot-password', publicRoute, async (req, res) => {
  const { email } = parseBody(forgotPasswordInput, req);
  await auth.requestPasswordReset(email);
  res.status(202).json({ ok: true, message: 'If an account exists for this address, a reset link is on its way.' });
});

authRouter.post('/reset-password', publicRoute, async (req, res) => {
  const { token, password } = parseBody(resetPasswordInput, req);
  await auth.resetPassword(token, password);
  res.json({ ok: true });
});
