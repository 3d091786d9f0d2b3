import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { LRUCache } from 'lru-cache';
import type { Config } from '../config/config';
import { AppError } from '../http/app-error';

export interface AccessClaims {
  userId: string;
  sessionId: string;
}

/** How many verified tokens are remembered at most. */
const REMEMBER_AT_MOST = 10_000;

/**
 * Short-lived access tokens: JWT HS256 signed with a KeyObject, issuer and audience pinned,
 * carrying the user id (`sub`) and the sign-in session id (`sid`).
 *
 * A token that passed verification is remembered, by its whole text (signature included), until
 * it expires: the next request with it skips the HMAC and the JSON decoding, about a tenth of the
 * server's work for a small signed-in request. Whether its session is still live is asked anew
 * every time (`SignedInUsers`).
 */
export class AccessTokens {
  private readonly key: KeyObject;
  private readonly verified = new LRUCache<string, AccessClaims>({ max: REMEMBER_AT_MOST });

  constructor(private readonly config: Config['auth']) {
    this.key = createSecretKey(Buffer.from(config.jwtSecret, 'utf8'));
  }

  /** Seconds an access token lives. */
  get lifetimeSeconds(): number {
    return this.config.accessTokenSeconds;
  }

  sign(claims: AccessClaims): string {
    return jwt.sign({ sid: claims.sessionId }, this.key, {
      algorithm: 'HS256',
      subject: claims.userId,
      issuer: this.config.issuer,
      audience: this.config.audience,
      expiresIn: this.config.accessTokenSeconds,
    });
  }

  /** Throws a 401 for anything but a valid, unexpired token of ours. */
  verify(token: string): AccessClaims {
    const known = this.verified.get(token);
    if (known) return known;
    try {
      const payload = jwt.verify(token, this.key, {
        algorithms: ['HS256'],
        issuer: this.config.issuer,
        audience: this.config.audience,
      }) as jwt.JwtPayload;
      if (typeof payload.sub !== 'string' || typeof payload.sid !== 'string' || typeof payload.exp !== 'number')
        throw new Error('claims missing');
      const claims = { userId: payload.sub, sessionId: payload.sid };
      // Forgotten the moment it expires; then jwt.verify above answers "expired" as before.
      this.verified.set(token, claims, { ttl: Math.max(1, payload.exp * 1000 - Date.now()) });
      return claims;
    } catch (err) {
      if (err instanceof jwt.TokenExpiredError) throw AppError.unauthorized('Your session has expired. Sign in again.', 'token_expired');
      throw AppError.unauthorized('The access token is not valid. Sign in again.', 'token_invalid');
    }
  }
}
