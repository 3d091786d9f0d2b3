import { DataTypes, type QueryInterface, type Sequelize } from 'sequelize';

/** Invitations by e-mail and the audit trail. */
export async function up(qi: QueryInterface, sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'invitations',
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
        workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.STRING(20), allowNull: false },
        token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'pending' },
        invited_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
        accepted_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
        expires_at: { type: DataTypes.DATE, allowNull: false },
        delivery: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'not_sent' },
        delivery_error: { type: DataTypes.STRING(500), allowNull: true },
        last_sent_at: { type: DataTypes.DATE, allowNull: true },
        accepted_at: { type: DataTypes.DATE, allowNull: true },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex('invitations', ['workspace_id', 'status'], { transaction });
    await qi.sequelize.query(
      "CREATE UNIQUE INDEX invitations_one_pending_per_address ON invitations (workspace_id, email) WHERE status = 'pending'",
      { transaction },
    );
    await qi.createTable(
      'audit_events',
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
        workspace_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
        actor_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
        action: { type: DataTypes.STRING(80), allowNull: false },
        target_type: { type: DataTypes.STRING(40), allowNull: false },
        target_id: { type: DataTypes.STRING(64), allowNull: true },
        target_label: { type: DataTypes.STRING(300), allowNull: true },
        details: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex('audit_events', ['workspace_id', 'created_at'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('audit_events');
  await qi.dropTable('invitations');
}
