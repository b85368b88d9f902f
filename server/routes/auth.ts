// Sign-up, verification, sign-in/out, forgot and reset. Thin: parse, call the service, answer.
import { Router, type Request, type Response, type NextFunction } from 'express';
import type passport from 'passport';
import type { AppContext } from '../context';
import type { RateLimits } from '../auth/rate-limits';
import { csrf } from '../auth/csrf';
import { AppError } from '../http/errors';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import * as accounts from '../services/accounts';
import type { User } from '../models';
import {
  forgotBodySchema,
  resendVerificationBodySchema,
  resetBodySchema,
  signInBodySchema,
  signUpBodySchema,
  verifyBodySchema,
} from '../../shared/schemas';

const signInFailures: Record<string, AppError> = {
  wrong: new AppError(401, 'wrong_credentials', 'E-mail or password is not right. Check both, or use "Forgot password".'),
  unverified: new AppError(403, 'email_unverified', 'Confirm your e-mail address first: follow the link we sent you, or ask for a new one.'),
  disabled: new AppError(403, 'account_disabled', 'This account has been disabled by a site admin.'),
};

function signIn(auth: passport.PassportStatic, req: Request, res: Response, next: NextFunction): void {
  auth.authenticate('local', (err: unknown, user: User | false, info?: { message?: string }) => {
    if (err) return next(err);
    if (!user) return next(signInFailures[info?.message ?? 'wrong'] ?? signInFailures.wrong);
    // passport regenerates the session id on login (session fixation).
    req.logIn(user, (loginErr) => {
      if (loginErr) return next(loginErr);
      res.json({ user: user.toView() });
    });
  })(req, res, next);
}

export function authRoutes(ctx: AppContext, auth: passport.PassportStatic, limits: RateLimits): Router {
  const router = Router();

  router.get('/csrf', (req, res) => {
    res.json({ csrfToken: csrf.generateToken(req) });
  });

  router.get('/me', (req, res) => {
    res.json({ user: currentUser(req).toView() });
  });

  router.post('/sign-up', limits.signUp, async (req, res) => {
    const body = parseInput(signUpBodySchema, req.body, 'body');
    await accounts.signUp(ctx, body);
    // The same answer whether or not the address already has an account (no account enumeration).
    res.status(201).json({ message: `Thanks. We have sent a message to ${body.email}: follow its link to confirm the address (not needed when you came from an invitation), then sign in.` });
  });

  router.post('/verify', async (req, res) => {
    const { token } = parseInput(verifyBodySchema, req.body, 'body');
    await accounts.verifyEmail(token);
    res.json({ message: 'Your e-mail address is confirmed; you can sign in.' });
  });

  router.post('/verify/resend', limits.reset, async (req, res) => {
    const { email } = parseInput(resendVerificationBodySchema, req.body, 'body');
    await accounts.resendVerification(ctx, email);
    res.status(202).json({ message: 'If that address has an unconfirmed account, a new confirmation link is on its way.' });
  });

  router.post('/sign-in', limits.signInByAddress, limits.signInByAccount, (req, res, next) => {
    parseInput(signInBodySchema, req.body, 'body');
    signIn(auth, req, res, next);
  });

  router.post('/sign-out', (req, res, next) => {
    req.logOut((err) => {
      if (err) return next(err);
      req.session.destroy((destroyErr) => {
        if (destroyErr) return next(destroyErr);
        res.clearCookie('patchcast.sid');
        res.status(204).end();
      });
    });
  });

  router.post('/forgot', limits.reset, async (req, res) => {
    const { email } = parseInput(forgotBodySchema, req.body, 'body');
    await accounts.requestReset(ctx, email);
    // The same answer whether or not the address has an account.
    res.status(202).json({ message: 'If an account uses that address, a reset link is on its way. It works once, for one hour.' });
  });

  router.post('/reset', limits.reset, async (req, res) => {
    const body = parseInput(resetBodySchema, req.body, 'body');
    await accounts.resetPassword(ctx, body);
    res.json({ message: 'Your password has been changed; sign in with the new one.' });
  });

  return router;
}
