import { LRUCache } from 'lru-cache';
import type { InferCreationAttributes } from 'sequelize';
import { Client } from 'pg';
import type { Logger } from 'pino';
import { AUTH_CHANGED_CHANNEL } from '../db/migrations/20261202-0008-auth-change-notices';
import { User } from '../models/init-models';

/** How long a looked-up sign-in is remembered at most, and how many are. */
const REMEMBER_MS = 60_000;
const REMEMBER_AT_MOST = 10_000;
/** Wait before listening again after the listening connection was lost. */
const RELISTEN_MS = 1_000;

type UserRow = InferCreationAttributes<User>;

/**
 * Who is signed in with a session: looked up in PostgreSQL (session live, user there) and
 * remembered for up to a minute, so a burst of requests from one sign-in costs one query.
 *
 * A database trigger announces every update or deletion of a user or sign-in session on
 * `auth_changed` (migration 0008); each server process listens and forgets that user's sign-ins
 * as the change commits, whichever process or tool made it. Revoking through `SignInSessions` in
 * this process forgets at once. While the listening connection is down, nothing is remembered:
 * every request asks the database, as it did before there was a memory.
 */
export class SignedInUsers {
  private readonly remembered = new LRUCache<string, { userId: string; row: UserRow }>({ max: REMEMBER_AT_MOST, ttl: REMEMBER_MS });
  /** Bumped by every forget: a lookup that raced a change does not store what it read. */
  private changes = 0;
  private listener: Client | null = null;
  private listening = false;
  private closed = false;
  private relisten: NodeJS.Timeout | null = null;

  constructor(
    private readonly databaseUrl: string,
    private readonly logger?: Logger,
  ) {}

  /** The user of a live session, or null when it was revoked, is unknown or its user is gone. */
  async find(sessionId: string, userId: string): Promise<User | null> {
    const known = this.listening ? this.remembered.get(sessionId) : undefined;
    if (known && known.userId === userId) return User.build(known.row, { isNewRecord: false, raw: true });
    const before = this.changes;
    const rows = await User.sequelize!.query<User>(SIGNED_IN_USER, { replacements: { sessionId, userId }, model: User, mapToModel: true });
    const user = rows[0] ?? null;
    if (user && this.listening && before === this.changes)
      this.remembered.set(sessionId, { userId, row: user.get({ plain: true }) as UserRow });
    return user;
  }

  forgetSession(sessionId: string): void {
    this.changes++;
    this.remembered.delete(sessionId);
  }

  forgetUser(userId: string): void {
    this.changes++;
    for (const [sessionId, entry] of this.remembered.entries()) if (entry.userId === userId) this.remembered.delete(sessionId);
  }

  /** Whether sign-ins are being remembered (the listening connection is up). */
  get remembering(): boolean {
    return this.listening;
  }

  /** Opens the listening connection; resolves once listening (or when it failed, then retries). */
  async listen(): Promise<void> {
    if (this.closed || this.listener) return;
    const client = new Client({ connectionString: this.databaseUrl, application_name: 'tumblewise-auth-listener' });
    this.listener = client;
    const lost = (err?: Error) => {
      if (this.listener !== client) return;
      this.stopRemembering();
      this.listener = null;
      client.removeAllListeners();
      client.on('error', () => {});
      void client.end().catch(() => {});
      if (this.closed) return;
      if (err) this.logger?.warn({ err }, 'auth change listener lost; sign-ins are not remembered until it is back');
      this.relisten = setTimeout(() => {
        this.relisten = null;
        void this.listen();
      }, RELISTEN_MS);
      this.relisten.unref();
    };
    client.on('error', lost);
    client.on('end', () => lost(new Error('connection ended')));
    client.on('notification', (message) => {
      if (message.channel === AUTH_CHANGED_CHANNEL && message.payload) this.forgetUser(message.payload);
    });
    try {
      await client.connect();
      await client.query(`LISTEN ${AUTH_CHANGED_CHANNEL}`);
      if (this.listener === client && !this.closed) this.listening = true;
    } catch (err) {
      lost(err as Error);
    }
  }

  async close(): Promise<void> {
    this.closed = true;
    if (this.relisten) clearTimeout(this.relisten);
    this.stopRemembering();
    const client = this.listener;
    this.listener = null;
    if (client) {
      client.removeAllListeners();
      client.on('error', () => {});
      await client.end().catch(() => {});
    }
  }

  private stopRemembering(): void {
    this.listening = false;
    this.changes++;
    this.remembered.clear();
  }
}

const SIGNED_IN_USER = `SELECT u.* FROM users u JOIN sign_in_sessions s ON s.user_id = u.id
  WHERE s.id = :sessionId AND u.id = :userId AND s.revoked_at IS NULL LIMIT 1`;
