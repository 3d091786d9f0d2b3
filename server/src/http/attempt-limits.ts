import type { Request, RequestHandler } from 'express';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config/config';
import { AppError } from './app-error';

/**
 * Attempt limits on sign-in, sign-up and password reset. Counters live in PostgreSQL
 * (rate-limiter-flexible's store, table `rate_limits`), so every server process shares them.
 */
export class AttemptLimits {
  readonly signin: RateLimiterPostgres;
  readonly signup: RateLimiterPostgres;
  readonly passwordReset: RateLimiterPostgres;

  constructor(sequelize: Sequelize, limits: Config['limits']) {
    const make = (keyPrefix: string, points: number) =>
      new RateLimiterPostgres({
        storeClient: sequelize,
        storeType: 'sequelize',
        tableName: 'rate_limits',
        tableCreated: true,
        keyPrefix,
        points,
        duration: limits.windowSeconds,
      });
    this.signin = make('signin', limits.signinPerWindow);
    this.signup = make('signup', limits.signupPerWindow);
    this.passwordReset = make('reset', limits.passwordResetPerWindow);
  }
}

/** Middleware consuming one point per request under the key; 429 with Retry-After when spent. */
export function limitAttempts(limiter: RateLimiterPostgres, key: (req: Request) => string, what: string): RequestHandler {
  return async (req, _res, next) => {
    try {
      await limiter.consume(key(req));
    } catch (err) {
      if (err instanceof RateLimiterRes) {
        const seconds = Math.max(1, Math.ceil(err.msBeforeNext / 1000));
        throw new AppError(429, 'too_many_attempts', `Too many ${what} attempts. Try again in ${seconds} seconds.`, undefined, {
          'Retry-After': String(seconds),
        });
      }
      throw err;
    }
    next();
  };
}

/** The caller's address plus the e-mail in the body, so one address cannot lock out everyone. */
export function ipAndEmail(req: Request): string {
  const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase().slice(0, 254) : '';
  return `${req.ip}|${email}`;
}
