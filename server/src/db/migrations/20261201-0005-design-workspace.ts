import { randomUUID } from 'node:crypto';
import { DataTypes, type QueryInterface, type Sequelize } from 'sequelize';
import { MATERIAL_LIBRARY } from './data/20261201-material-library';

const uuid = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const ref = (model: string, onDelete: 'CASCADE' | 'SET NULL' = 'CASCADE', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model, key: 'id' },
  onDelete,
});
const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
  updated_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
};

/** Materials (with the seeded library), parts, variants, meshes, the sign-off thread, measured data, scatter studies. */
export async function up(qi: QueryInterface, sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    await qi.createTable(
      'materials',
      {
        id: uuid,
        workspace_id: ref('workspaces', 'CASCADE', true),
        name: { type: DataTypes.STRING(120), allowNull: false },
        family: { type: DataTypes.STRING(20), allowNull: false },
        density: { type: DataTypes.DOUBLE, allowNull: false },
        density_tolerance: { type: DataTypes.DOUBLE, allowNull: false },
        source: { type: DataTypes.STRING(300), allowNull: false },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('materials', ['workspace_id'], { transaction });
    await qi.bulkInsert(
      'materials',
      MATERIAL_LIBRARY.map((m) => ({
        id: randomUUID(),
        workspace_id: null,
        name: m.name,
        family: m.family,
        density: m.density,
        density_tolerance: m.densityTolerance,
        source: m.source,
        created_at: new Date(),
        updated_at: new Date(),
      })),
      { transaction },
    );

    await qi.createTable(
      'parts',
      {
        id: uuid,
        workspace_id: ref('workspaces'),
        project_id: ref('projects'),
        name: { type: DataTypes.STRING(120), allowNull: false },
        draft: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        draft_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('parts', ['workspace_id', 'project_id'], { transaction });

    await qi.createTable(
      'variants',
      {
        id: uuid,
        workspace_id: ref('workspaces'),
        part_id: ref('parts'),
        number: { type: DataTypes.INTEGER, allowNull: false },
        label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        document: { type: DataTypes.JSONB, allowNull: false },
        report: { type: DataTypes.JSONB, allowNull: false },
        engine_version: { type: DataTypes.STRING(40), allowNull: false },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
        author_id: ref('users', 'SET NULL', true),
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('variants', ['part_id', 'number'], { unique: true, transaction });
    await qi.addIndex('variants', ['workspace_id'], { transaction });

    await qi.createTable(
      'meshes',
      {
        id: uuid,
        workspace_id: ref('workspaces'),
        name: { type: DataTypes.STRING(200), allowNull: false },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        byte_size: { type: DataTypes.INTEGER, allowNull: false },
        triangle_count: { type: DataTypes.INTEGER, allowNull: false },
        format: { type: DataTypes.STRING(10), allowNull: false },
        data: { type: DataTypes.BLOB, allowNull: false },
        report: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        created_by_id: ref('users', 'SET NULL', true),
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('meshes', ['workspace_id'], { transaction });

    await qi.createTable(
      'review_entries',
      {
        id: uuid,
        workspace_id: ref('workspaces'),
        variant_id: ref('variants'),
        kind: { type: DataTypes.STRING(30), allowNull: false },
        author_id: ref('users', 'SET NULL', true),
        reviewer_id: ref('users', 'SET NULL', true),
        body: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex('review_entries', ['variant_id', 'created_at'], { transaction });

    await qi.createTable(
      'measurements',
      {
        id: uuid,
        workspace_id: ref('workspaces'),
        variant_id: ref('variants'),
        axis: { type: DataTypes.STRING(120), allowNull: false },
        value: { type: DataTypes.DOUBLE, allowNull: false },
        entered_value: { type: DataTypes.DOUBLE, allowNull: false },
        entered_unit: { type: DataTypes.STRING(20), allowNull: false },
        method: { type: DataTypes.STRING(200), allowNull: false },
        created_by_id: ref('users', 'SET NULL', true),
        created_at: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { transaction },
    );
    await qi.addIndex('measurements', ['variant_id'], { transaction });

    await qi.createTable(
      'scatter_studies',
      {
        id: uuid,
        workspace_id: ref('workspaces'),
        variant_id: ref('variants', 'SET NULL', true),
        document: { type: DataTypes.JSONB, allowNull: false },
        tolerances: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        samples: { type: DataTypes.INTEGER, allowNull: false },
        seed: { type: DataTypes.INTEGER, allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'queued' },
        progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        result: { type: DataTypes.JSONB, allowNull: true },
        error: { type: DataTypes.STRING(1000), allowNull: true },
        job_id: { type: DataTypes.STRING(64), allowNull: true },
        created_by_id: ref('users', 'SET NULL', true),
        ...timestamps,
      },
      { transaction },
    );
    await qi.addIndex('scatter_studies', ['workspace_id'], { transaction });
  });
}

export async function down(qi: QueryInterface): Promise<void> {
  for (const t of ['scatter_studies', 'measurements', 'review_entries', 'meshes', 'variants', 'parts', 'materials']) await qi.dropTable(t);
}
