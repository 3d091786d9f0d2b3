import { DataTypes, type QueryInterface, type Sequelize } from 'sequelize';

const id = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

/** Users, workspaces, memberships, sign-in sessions with their refresh tokens, password resets. */
export async function up(qi: QueryInterface, sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'users',
      {
        id,
        email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        password_hash: { type: DataTypes.STRING(100), allowNull: false },
        is_operator: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.createTable(
      'workspaces',
      {
        id,
        name: { type: DataTypes.STRING(80), allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'active' },
        ...timestamps,
      },
      { transaction },
    );
    await qi.createTable(
      'memberships',
      {
        id,
        workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
        user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
        role: { type: DataTypes.STRING(20), allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('memberships', ['workspace_id', 'user_id'], { unique: true, transaction });
    await qi.addIndex('memberships', ['user_id'], { transaction });
    await qi.sequelize.query(
      "ALTER TABLE memberships ADD CONSTRAINT memberships_role_check CHECK (role IN ('owner','admin','designer','reviewer'))",
      { transaction },
    );
    await qi.createTable(
      'sign_in_sessions',
      {
        id,
        user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
        revoked_at: { type: DataTypes.DATE, allowNull: true },
        revoked_reason: { type: DataTypes.STRING(40), allowNull: true },
        user_agent: { type: DataTypes.STRING(300), allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('sign_in_sessions', ['user_id'], { transaction });
    await qi.createTable(
      'refresh_tokens',
      {
        id,
        session_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'sign_in_sessions', key: 'id' }, onDelete: 'CASCADE' },
        token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expires_at: { type: DataTypes.DATE, allowNull: false },
        rotated_at: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('refresh_tokens', ['session_id'], { transaction });
    await qi.createTable(
      'password_resets',
      {
        id,
        user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
        token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expires_at: { type: DataTypes.DATE, allowNull: false },
        used_at: { type: DataTypes.DATE, allowNull: true },
        ...timestamps,
      },
      { transaction },
    );
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const table of ['password_resets', 'refresh_tokens', 'sign_in_sessions', 'memberships', 'workspaces', 'users']) {
    await qi.dropTable(table);
  }
}
