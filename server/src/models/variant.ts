import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { Variant as VariantDto, VariantStatus } from '@tumblewise/shared';
import type { User } from './user';

/** A saved variant: the part document frozen with its spin report and the engine version that made it. */
export class Variant extends Model<InferAttributes<Variant>, InferCreationAttributes<Variant>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare partId: string;
  declare number: number;
  declare label: CreationOptional<string>;
  declare notes: CreationOptional<string>;
  declare document: unknown;
  declare report: unknown;
  declare engineVersion: string;
  declare status: CreationOptional<VariantStatus>;
  declare authorId: string | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare author?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    Variant.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        partId: { type: DataTypes.UUID, allowNull: false },
        number: { type: DataTypes.INTEGER, allowNull: false },
        label: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        document: { type: DataTypes.JSONB, allowNull: false },
        report: { type: DataTypes.JSONB, allowNull: false },
        engineVersion: { type: DataTypes.STRING(40), allowNull: false },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
        authorId: { type: DataTypes.UUID, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'variants' },
    );
  }

  toDto(): VariantDto {
    return {
      id: this.id,
      partId: this.partId,
      number: this.number,
      label: this.label,
      notes: this.notes,
      document: this.document,
      report: this.report,
      engineVersion: this.engineVersion,
      status: this.status,
      author: this.author ? { id: this.author.id, name: this.author.name } : null,
      version: this.version,
      createdAt: this.createdAt.toISOString(),
      updatedAt: this.updatedAt.toISOString(),
    };
  }
}
