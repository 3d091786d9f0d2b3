import { DataTypes, type QueryInterface, type Sequelize } from 'sequelize';

/** Which import each measured row came in with, so one import can be removed as a whole. Older rows keep null. */
export async function up(qi: QueryInterface, sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await qi.addColumn('measurements', 'import_id', { type: DataTypes.UUID, allowNull: true }, { transaction });
    await qi.addIndex('measurements', ['variant_id', 'import_id'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  await qi.removeIndex('measurements', ['variant_id', 'import_id']);
  await qi.removeColumn('measurements', 'import_id');
}
