import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Workspace as WorkspaceDto } from '@tumblewise/shared';

export type WorkspaceState = WorkspaceDto['state'];

/** A tenant: a team's shared space. Every row of workspace data carries its id. */
export class Workspace extends Model<InferAttributes<Workspace>, InferCreationAttributes<Workspace>> {
  declare id: CreationOptional<string>;
  declare name: string;
  declare state: CreationOptional<WorkspaceState>;
  declare planId: CreationOptional<string | null>;
  declare seats: CreationOptional<number | null>;
  declare customerId: CreationOptional<string | null>;
  declare subscriptionId: CreationOptional<string | null>;
  declare subscriptionItemId: CreationOptional<string | null>;
  declare subscriptionStatus: CreationOptional<string | null>;
  declare cancelAtPeriodEnd: CreationOptional<boolean>;
  declare currentPeriodEnd: CreationOptional<Date | null>;
  declare trialEndsAt: CreationOptional<Date | null>;
  declare cardBrand: CreationOptional<string | null>;
  declare cardLast4: CreationOptional<string | null>;
  declare cardExpMonth: CreationOptional<number | null>;
  declare cardExpYear: CreationOptional<number | null>;
  declare pastDueSince: CreationOptional<Date | null>;
  declare billingEventAt: CreationOptional<Date | null>;
  declare suspendedReason: CreationOptional<string | null>;
  declare settings: CreationOptional<Record<string, unknown>>;
  declare lastActivityAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Workspace.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        name: { type: DataTypes.STRING(80), allowNull: false },
        state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'active' },
        planId: DataTypes.STRING(40),
        seats: DataTypes.INTEGER,
        customerId: DataTypes.STRING(80),
        subscriptionId: DataTypes.STRING(80),
        subscriptionItemId: DataTypes.STRING(80),
        subscriptionStatus: DataTypes.STRING(20),
        cancelAtPeriodEnd: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        currentPeriodEnd: DataTypes.DATE,
        trialEndsAt: DataTypes.DATE,
        cardBrand: DataTypes.STRING(20),
        cardLast4: DataTypes.STRING(4),
        cardExpMonth: DataTypes.INTEGER,
        cardExpYear: DataTypes.INTEGER,
        pastDueSince: DataTypes.DATE,
        billingEventAt: DataTypes.DATE,
        suspendedReason: DataTypes.STRING(500),
        settings: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        lastActivityAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'workspaces' },
    );
  }

  /** Days a past-due workspace keeps working before it turns read-only (set from config at start). */
  static graceDays = 7;

  /** When a past-due workspace turns read-only, or null. */
  readOnlyFrom(): Date | null {
    return this.state === 'past_due' && this.pastDueSince ? new Date(this.pastDueSince.getTime() + Workspace.graceDays * 86400_000) : null;
  }

  /** The state as users meet it: past due beyond the grace period is read-only. */
  effectiveState(now = Date.now()): WorkspaceState {
    const from = this.readOnlyFrom();
    return from && from.getTime() <= now ? 'read_only' : this.state;
  }

  toDto(): WorkspaceDto {
    return {
      id: this.id,
      name: this.name,
      state: this.effectiveState(),
      readOnlyFrom: this.readOnlyFrom()?.toISOString() ?? null,
      suspendedReason: this.state === 'suspended' ? (this.suspendedReason ?? null) : null,
      createdAt: this.createdAt.toISOString(),
    };
  }
}
