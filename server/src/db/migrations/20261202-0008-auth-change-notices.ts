import type { QueryInterface, Sequelize } from 'sequelize';

/** The channel on which PostgreSQL announces a change to a user or to one of their sign-in sessions. */
export const AUTH_CHANGED_CHANNEL = 'auth_changed';

/** The tables whose changes are announced, and the column holding the user's id. */
const ANNOUNCING_TABLES = [
  { table: 'users', userId: 'id' },
  { table: 'sign_in_sessions', userId: 'user_id' },
];

/**
 * Every update or deletion of a user or a sign-in session announces the user's id on
 * `auth_changed` when its transaction commits, whatever code (or person at a SQL prompt) made it.
 * Server processes that remember who is signed in listen and forget that user at once.
 */
export async function up(_qi: QueryInterface, sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    for (const { table, userId } of ANNOUNCING_TABLES) {
      await sequelize.query(
        `
        CREATE FUNCTION ${table}_announce_auth_change() RETURNS trigger LANGUAGE plpgsql AS $$
        BEGIN
          PERFORM pg_notify('${AUTH_CHANGED_CHANNEL}', OLD.${userId}::text);
          RETURN NULL;
        END $$`,
        { transaction },
      );
      await sequelize.query(
        `CREATE TRIGGER ${table}_announce_auth_change AFTER UPDATE OR DELETE ON ${table}
        FOR EACH ROW EXECUTE FUNCTION ${table}_announce_auth_change()`,
        { transaction },
      );
    }
  });
}

export async function down(_qi: QueryInterface, sequelize: Sequelize): Promise<void> {
  for (const { table } of ANNOUNCING_TABLES) {
    await sequelize.query(`DROP TRIGGER IF EXISTS ${table}_announce_auth_change ON ${table}`);
    await sequelize.query(`DROP FUNCTION IF EXISTS ${table}_announce_auth_change()`);
  }
}
