import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import * as accounts from './migrations/20261201-0001-accounts';
import * as invitations from './migrations/20261201-0002-invitations-audit';
import * as projects from './migrations/20261201-0003-projects';
import * as rateLimits from './migrations/20261201-0004-rate-limits';
import * as designWorkspace from './migrations/20261201-0005-design-workspace';
import * as billing from './migrations/20261201-0006-billing';
import * as measurementImports from './migrations/20261201-0007-measurement-imports';
import * as authChangeNotices from './migrations/20261202-0008-auth-change-notices';

/** Migrations in the order they run. Migrations are history: never edit one that landed, add one. */
const MIGRATIONS = [
  { name: '20261201-0001-accounts', module: accounts },
  { name: '20261201-0002-invitations-audit', module: invitations },
  { name: '20261201-0003-projects', module: projects },
  { name: '20261201-0004-rate-limits', module: rateLimits },
  { name: '20261201-0005-design-workspace', module: designWorkspace },
  { name: '20261201-0006-billing', module: billing },
  { name: '20261201-0007-measurement-imports', module: measurementImports },
  { name: '20261202-0008-auth-change-notices', module: authChangeNotices },
];

export interface Migration {
  up(qi: QueryInterface, sequelize: Sequelize): Promise<void>;
  down(qi: QueryInterface, sequelize: Sequelize): Promise<void>;
}

/** umzug over an explicit list (glob names differ between compiled and source runs). */
export function createMigrator(sequelize: Sequelize): Umzug<QueryInterface> {
  return new Umzug({
    migrations: MIGRATIONS.map(({ name, module }) => ({
      name,
      up: ({ context }) => (module as Migration).up(context, sequelize),
      down: ({ context }) => (module as Migration).down(context, sequelize),
    })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: undefined,
  });
}

/** Applies every pending migration; returns the names applied. */
export async function migrate(sequelize: Sequelize): Promise<string[]> {
  const done = await createMigrator(sequelize).up();
  return done.map((m) => m.name);
}
