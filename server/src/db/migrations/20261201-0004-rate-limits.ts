import type { QueryInterface } from 'sequelize';

/**
 * Counters of the attempt limits, shared by every server process (rate-limiter-flexible's
 * PostgreSQL store layout: key, points, expire in ms).
 */
export async function up(qi: QueryInterface): Promise<void> {
  await qi.sequelize.query(
    'CREATE TABLE IF NOT EXISTS rate_limits (key varchar(255) PRIMARY KEY, points integer NOT NULL DEFAULT 0, expire bigint)',
  );
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('rate_limits');
}
