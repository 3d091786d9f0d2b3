import type { Logger } from 'pino';
import type { Sequelize } from 'sequelize';
import type { AccessTokens } from './accounts/access-tokens';
import type { Passwords } from './accounts/passwords';
import type { SignInSessions } from './accounts/sign-in-sessions';
import type { SignedInUsers } from './accounts/signed-in-users';
import type { Config } from './config/config';
import type { ApiCatalogue } from './http/api-catalogue';
import type { AttemptLimits } from './http/attempt-limits';
import type { Mailer } from './mail/mailer';
import type { PaymentProvider } from './billing/payment-provider';
import type { ComputePool } from './compute/compute-pool';
import type { ScatterQueue } from './scatter/scatter-queue';

/** The long-lived collaborators of one server process, built once in `createContext`. */
export interface AppContext {
  config: Config;
  logger: Logger;
  sequelize: Sequelize;
  mailer: Mailer;
  tokens: AccessTokens;
  passwords: Passwords;
  sessions: SignInSessions;
  signedIn: SignedInUsers;
  limits: AttemptLimits;
  payment: PaymentProvider;
  compute: ComputePool;
  scatter: ScatterQueue;
  catalogue: ApiCatalogue;
}
