import type { Request, Response } from 'express';
import type { Config } from '../config/config';

export const REFRESH_COOKIE = 'tw_refresh';
const COOKIE_PATH = '/api/v1/auth';

/** The refresh token travels only in an httpOnly, SameSite=Strict cookie scoped to /api/v1/auth. */
export function setRefreshCookie(res: Response, token: string, config: Config['auth']): void {
  res.cookie(REFRESH_COOKIE, token, {
    httpOnly: true,
    sameSite: 'strict',
    secure: config.cookieSecure,
    path: COOKIE_PATH,
    maxAge: config.refreshTokenDays * 86400_000,
  });
}

export function clearRefreshCookie(res: Response, config: Config['auth']): void {
  res.clearCookie(REFRESH_COOKIE, { httpOnly: true, sameSite: 'strict', secure: config.cookieSecure, path: COOKIE_PATH });
}

export function readRefreshCookie(req: Request): string | null {
  const value = (req.cookies as Record<string, unknown> | undefined)?.[REFRESH_COOKIE];
  return typeof value === 'string' && /^[A-Za-z0-9_-]{20,200}$/.test(value) ? value : null;
}
