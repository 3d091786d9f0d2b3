import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import type { Config } from '../config/config';
import { AppError } from '../http/app-error';

export interface AccessClaims {
  userId: string;
  sessionId: string;
}

/**
 * Short-lived access tokens: JWT HS256 signed with a KeyObject, issuer and audience pinned,
 * carrying the user id (`sub`) and the sign-in session id (`sid`).
 */
export class AccessTokens {
  private readonly key: KeyObject;

  constructor(private readonly config: Config['auth']) {
    this.key = createSecretKey(Buffer.from(config.jwtSecret, 'utf8'));
  }

  /** Seconds an access token lives. */
  get lifetimeSeconds(): number {
    return this.config.accessTokenSeconds;
  }

  sign(claims: AccessClaims): string {
    return jwt.sign({ sid: claims.sessionId }, this.key, {
      algorithm: 'HS256', subject: claims.userId, issuer: this.config.issuer, audience: this.config.audience,
      expiresIn: this.config.accessTokenSeconds,
    });
  }

  /** Throws a 401 for anything but a valid, unexpired token of ours. */
  verify(token: string): AccessClaims {
    try {
      const payload = jwt.verify(token, this.key, { algorithms: ['HS256'], issuer: this.config.issuer, audience: this.config.audience }) as jwt.JwtPayload;
      if (typeof payload.sub !== 'string' || typeof payload.sid !== 'string') throw new Error('claims missing');
      return { userId: payload.sub, sessionId: payload.sid };
    } catch (err) {
      if (err instanceof jwt.TokenExpiredError) throw AppError.unauthorized('Your session has expired. Sign in again.', 'token_expired');
      throw AppError.unauthorized('The access token is not valid. Sign in again.', 'token_invalid');
    }
  }
}
