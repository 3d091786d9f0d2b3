import { DataTypes, type QueryInterface, type Sequelize } from 'sequelize';

/** Projects of a workspace (parts and variants follow in later migrations). */
export async function up(qi: QueryInterface, sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'projects',
      {
        id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
        workspace_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'workspaces', key: 'id' }, onDelete: 'CASCADE' },
        name: { type: DataTypes.STRING(120), allowNull: false },
        category: { type: DataTypes.STRING(40), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        created_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex('projects', ['workspace_id'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.dropTable('projects');
}
