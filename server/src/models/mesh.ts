import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Mesh as MeshDto } from '@tumblewise/shared';

/** An uploaded STL file, kept in PostgreSQL with its SHA-256 and its validation report. */
export class Mesh extends Model<InferAttributes<Mesh>, InferCreationAttributes<Mesh>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare name: string;
  declare sha256: string;
  declare byteSize: number;
  declare triangleCount: number;
  declare format: 'binary' | 'ascii';
  declare data: Buffer;
  declare report: MeshDto['report'];
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Mesh.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: false },
        sha256: { type: DataTypes.STRING(64), allowNull: false },
        byteSize: { type: DataTypes.INTEGER, allowNull: false },
        triangleCount: { type: DataTypes.INTEGER, allowNull: false },
        format: { type: DataTypes.STRING(10), allowNull: false },
        data: { type: DataTypes.BLOB, allowNull: false },
        report: { type: DataTypes.JSONB, allowNull: false },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'meshes' },
    );
  }

  toDto(): MeshDto {
    return {
      id: this.id,
      name: this.name,
      sha256: this.sha256,
      byteSize: this.byteSize,
      triangleCount: this.triangleCount,
      format: this.format,
      report: this.report,
      createdAt: this.createdAt.toISOString(),
    };
  }
}
