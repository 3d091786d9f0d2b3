import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Workspace as WorkspaceDto } from '@tumblewise/shared';

export type WorkspaceState = WorkspaceDto['state'];

/** A tenant: a team's shared space. Every row of workspace data carries its id. */
export class Workspace extends Model<InferAttributes<Workspace>, InferCreationAttributes<Workspace>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare state: CreationOptional<WorkspaceState>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Workspace.init({
      id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
      name: { type: DataTypes.STRING(80), allowNull: false },
      state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'active' },
      createdAt: DataTypes.DATE,
      updatedAt: DataTypes.DATE,
    }, { sequelize, tableName: 'workspaces' });
  }

  toDto(): WorkspaceDto {
    return { id: this.id, name: this.name, state: this.state, createdAt: this.createdAt.toISOString() };
  }
}
