// Brute-force brakes on the account routes (express-rate-limit, per process).
import { rateLimit, type RateLimitRequestHandler } from 'express-rate-limit';
import { errorBody, AppError } from '../http/errors';

const FIFTEEN_MINUTES_MS = 15 * 60_000;

function limiter(limit: number, what: string, keyGenerator?: (req: import('express').Request) => string, skipSuccessfulRequests = false): RateLimitRequestHandler {
  return rateLimit({
    windowMs: FIFTEEN_MINUTES_MS,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests,
    ...(keyGenerator ? { keyGenerator } : {}),
    handler: (_req, res) => {
      res.status(429).json(errorBody(new AppError(429, 'rate_limited', `Too many ${what}: wait 15 minutes and try again.`)));
    },
  });
}

export type RateLimits = { signInByAddress: RateLimitRequestHandler; signInByAccount: RateLimitRequestHandler; signUp: RateLimitRequestHandler; reset: RateLimitRequestHandler };

/** New limiters per app instance, so each test file starts with clean counters. */
export function createRateLimits(): RateLimits {
  return {
    // Failed attempts only: a person who signs in correctly is never slowed down.
    signInByAddress: limiter(20, 'failed sign-in attempts from this address', undefined, true),
    signInByAccount: limiter(
      5,
      'failed sign-in attempts for this account',
      (req) => `account:${String((req.body as { email?: unknown })?.email ?? '').trim().toLowerCase()}`,
      true,
    ),
    signUp: limiter(10, 'sign-ups from this address'),
    reset: limiter(5, 'password reset requests from this address'),
  };
}
