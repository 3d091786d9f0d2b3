import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { AuditEvent as AuditEventDto } from '@tumblewise/shared';
import type { User } from './user';
import type { Workspace } from './workspace';

/** Who did what to which target, when, in which workspace. Rows are only ever added. */
export class AuditEvent extends Model<InferAttributes<AuditEvent>, InferCreationAttributes<AuditEvent>> {
  declare id: CreationOptional<string>;
  declare workspaceId: ForeignKey<Workspace['id']> | null;
  declare actorId: ForeignKey<User['id']> | null;
  declare action: string;
  declare targetType: string;
  declare targetId: string | null;
  declare targetLabel: string | null;
  declare details: CreationOptional<Record<string, unknown>>;
  declare createdAt: CreationOptional<Date>;
  declare actor?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    AuditEvent.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        action: { type: DataTypes.STRING(80), allowNull: false },
        targetType: { type: DataTypes.STRING(40), allowNull: false },
        targetId: { type: DataTypes.STRING(64), allowNull: true },
        targetLabel: { type: DataTypes.STRING(300), allowNull: true },
        details: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_events', updatedAt: false },
    );
  }

  toDto(): AuditEventDto {
    return {
      id: this.id,
      at: this.createdAt.toISOString(),
      action: this.action,
      actor: this.actor ? { id: this.actor.id, name: this.actor.name, email: this.actor.email } : null,
      targetType: this.targetType,
      targetId: this.targetId,
      targetLabel: this.targetLabel,
      details: this.details,
    };
  }
}
