import pino from 'pino';
import { AccessTokens } from './accounts/access-tokens';
import { Passwords } from './accounts/passwords';
import { SignInSessions } from './accounts/sign-in-sessions';
import { SignedInUsers } from './accounts/signed-in-users';
import type { AppContext } from './app-context';
import { PaymentProvider } from './billing/payment-provider';
import { ComputePool } from './compute/compute-pool';
import type { Config } from './config/config';
import { createDatabase } from './db/database';
import { ApiCatalogue } from './http/api-catalogue';
import { AttemptLimits } from './http/attempt-limits';
import { Mailer } from './mail/mailer';
import { ScatterQueue } from './scatter/scatter-queue';
import { Workspace } from './models/init-models';

/** Wires the collaborators of one server process from its configuration. */
export function createContext(config: Config, options: { logStream?: pino.DestinationStream } = {}): AppContext {
  const logger = pino(
    { level: config.logLevel, redact: ['password', '*.password', 'token', '*.token', 'accessToken', '*.accessToken'] },
    options.logStream ?? pino.destination(1),
  );
  const sequelize = createDatabase(config.databaseUrl);
  Workspace.graceDays = config.billing.graceDays;
  const signedIn = new SignedInUsers(config.databaseUrl, logger);
  void signedIn.listen();
  const ctx = {
    config,
    logger,
    sequelize,
    mailer: new Mailer(config.mail),
    tokens: new AccessTokens(config.auth),
    passwords: new Passwords(config.auth.bcryptCost),
    sessions: new SignInSessions(config.auth, signedIn),
    signedIn,
    limits: new AttemptLimits(sequelize, config.limits),
    payment: new PaymentProvider(config.payment),
    compute: new ComputePool(),
    catalogue: new ApiCatalogue(),
  } as AppContext;
  ctx.scatter = new ScatterQueue(ctx);
  return ctx;
}

/** Closes pools and connections so the process can exit. */
export async function closeContext(ctx: AppContext): Promise<void> {
  ctx.mailer.close();
  await ctx.scatter.stop();
  await Promise.all([ctx.sequelize.close(), ctx.compute.close(), ctx.signedIn.close()]);
}
