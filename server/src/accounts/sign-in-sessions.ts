import { Op, type Transaction } from 'sequelize';
import type { Config } from '../config/config';
import { AppError } from '../http/app-error';
import { RefreshToken, SignInSession, User } from '../models/init-models';
import { hashToken, newSecureToken } from './secure-token';
import type { SignedInUsers } from './signed-in-users';

/**
 * Sign-in sessions and their refresh tokens. Every refresh rotates the token; presenting a token
 * that was already rotated means it was copied, so the whole session (token family) is revoked.
 */
export class SignInSessions {
  constructor(
    private readonly config: Config['auth'],
    private readonly signedIn?: SignedInUsers,
  ) {}

  /** Starts a session; returns it with its first refresh token (plain, for the cookie). */
  async start(
    userId: string,
    userAgent: string | undefined,
    transaction?: Transaction,
  ): Promise<{ sessionId: string; refreshToken: string }> {
    const session = await SignInSession.create(
      { userId, userAgent: userAgent?.slice(0, 300) ?? null, revokedAt: null, revokedReason: null },
      { transaction },
    );
    const refreshToken = await this.issueToken(session.id, transaction);
    return { sessionId: session.id, refreshToken };
  }

  /** Exchanges a refresh token for a new one; 401 when unknown, expired, revoked or reused. */
  async rotate(presented: string): Promise<{ user: User; sessionId: string; refreshToken: string }> {
    const stored = await RefreshToken.findOne({ where: { tokenHash: hashToken(presented) } });
    if (!stored) throw AppError.unauthorized('Your session has ended. Sign in again.', 'refresh_invalid');
    const session = await SignInSession.findByPk(stored.sessionId);
    if (!session || session.revokedAt) throw AppError.unauthorized('Your session has ended. Sign in again.', 'refresh_invalid');
    // Claim the token atomically: only one caller can rotate it.
    const [claimed] = await RefreshToken.update({ rotatedAt: new Date() }, { where: { id: stored.id, rotatedAt: { [Op.is]: null } } });
    if (claimed === 0) {
      await this.revoke(session.id, 'refresh_reused');
      throw AppError.unauthorized(
        'This sign-in was used from somewhere else, so it has been ended for safety. Sign in again.',
        'refresh_reused',
      );
    }
    if (stored.expiresAt.getTime() <= Date.now())
      throw AppError.unauthorized('Your session has expired. Sign in again.', 'refresh_expired');
    const user = await User.findByPk(session.userId);
    if (!user) throw AppError.unauthorized('This account no longer exists.', 'refresh_invalid');
    const refreshToken = await this.issueToken(session.id);
    return { user, sessionId: session.id, refreshToken };
  }

  /** Ends the session of a refresh token, if it is one of ours. */
  async revokeByToken(presented: string): Promise<void> {
    const stored = await RefreshToken.findOne({ where: { tokenHash: hashToken(presented) } });
    if (stored) await this.revoke(stored.sessionId, 'signed_out');
  }

  async revoke(sessionId: string, reason: string): Promise<void> {
    await SignInSession.update(
      { revokedAt: new Date(), revokedReason: reason },
      { where: { id: sessionId, revokedAt: { [Op.is]: null } } },
    );
    // The database announces it to every process; this one need not wait for the notice.
    this.signedIn?.forgetSession(sessionId);
  }

  /** Ends every session of a user (after a password reset). */
  async revokeAllOf(userId: string, reason: string, transaction?: Transaction): Promise<void> {
    await SignInSession.update(
      { revokedAt: new Date(), revokedReason: reason },
      { where: { userId, revokedAt: { [Op.is]: null } }, transaction },
    );
    // Forgotten now and again when the announcement arrives at commit (a lookup meanwhile is not kept).
    this.signedIn?.forgetUser(userId);
  }

  private async issueToken(sessionId: string, transaction?: Transaction): Promise<string> {
    const { token, hash } = newSecureToken();
    const expiresAt = new Date(Date.now() + this.config.refreshTokenDays * 86400_000);
    await RefreshToken.create({ sessionId, tokenHash: hash, expiresAt, rotatedAt: null }, { transaction });
    return token;
  }
}
