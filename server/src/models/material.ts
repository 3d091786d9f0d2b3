import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Material as MaterialDto } from '@tumblewise/shared';

/** A material: the global library (workspaceId null) or a workspace's own. */
export class Material extends Model<InferAttributes<Material>, InferCreationAttributes<Material>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string | null;
  declare name: string;
  declare family: MaterialDto['family'];
  declare density: number;
  declare densityTolerance: number;
  declare source: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Material.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        workspaceId: { type: DataTypes.UUID, allowNull: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        family: { type: DataTypes.STRING(20), allowNull: false },
        density: { type: DataTypes.DOUBLE, allowNull: false },
        densityTolerance: { type: DataTypes.DOUBLE, allowNull: false },
        source: { type: DataTypes.STRING(300), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'materials' },
    );
  }

  toDto(): MaterialDto {
    return {
      id: this.id,
      name: this.name,
      family: this.family,
      density: this.density,
      densityTolerance: this.densityTolerance,
      source: this.source,
      scope: this.workspaceId ? 'workspace' : 'library',
      createdAt: this.createdAt.toISOString(),
    };
  }
}
