import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ScatterStudy as ScatterStudyDto } from '@tumblewise/shared';

/** A Monte Carlo study over tolerances, run by the background queue. */
export class ScatterStudy extends Model<InferAttributes<ScatterStudy>, InferCreationAttributes<ScatterStudy>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare variantId: string | null;
  declare document: unknown;
  declare tolerances: CreationOptional<Record<string, { density?: number; size?: number }>>;
  declare samples: number;
  declare seed: number;
  declare state: CreationOptional<ScatterStudyDto['state']>;
  declare progress: CreationOptional<number>;
  declare result: CreationOptional<object | null>;
  declare error: CreationOptional<string | null>;
  declare jobId: CreationOptional<string | null>;
  declare createdById: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ScatterStudy.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        variantId: { type: DataTypes.UUID, allowNull: true },
        document: { type: DataTypes.JSONB, allowNull: false },
        tolerances: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        samples: { type: DataTypes.INTEGER, allowNull: false },
        seed: { type: DataTypes.INTEGER, allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'queued' },
        progress: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0 },
        result: { type: DataTypes.JSONB, allowNull: true },
        error: { type: DataTypes.STRING(1000), allowNull: true },
        jobId: { type: DataTypes.STRING(64), allowNull: true },
        createdById: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'scatter_studies' },
    );
  }

  toDto(): ScatterStudyDto {
    return {
      id: this.id,
      variantId: this.variantId,
      state: this.state,
      progress: this.progress,
      samples: this.samples,
      seed: this.seed,
      result: this.result ?? null,
      error: this.error ?? null,
      createdAt: this.createdAt.toISOString(),
      updatedAt: this.updatedAt.toISOString(),
    };
  }
}
