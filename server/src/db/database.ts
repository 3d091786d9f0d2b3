import { Sequelize } from 'sequelize';
import { initModels } from '../models/init-models';

/** One Sequelize instance per server process, with its models initialised. */
export function createDatabase(databaseUrl: string): Sequelize {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: 'postgres',
    logging: false,
    pool: { max: 10, min: 0, idle: 10000, acquire: 5000 },
    dialectOptions: { connectionTimeoutMillis: 3000, application_name: 'tumblewise' },
    define: { underscored: true },
  });
  initModels(sequelize);
  return sequelize;
}
