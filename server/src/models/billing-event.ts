import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A payment-provider event seen once (its id is the primary key: replays are recognised). */
export class BillingEvent extends Model<InferAttributes<BillingEvent>, InferCreationAttributes<BillingEvent>> {
  declare id: string;
  declare type: string;
  declare workspaceId: string | null;
  declare providerCreatedAt: Date;
  declare applied: boolean;
  declare receivedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    BillingEvent.init(
      {
        id: { type: DataTypes.STRING(80), primaryKey: true },
        type: { type: DataTypes.STRING(80), allowNull: false },
        workspaceId: { type: DataTypes.UUID, allowNull: true },
        providerCreatedAt: { type: DataTypes.DATE, allowNull: false },
        applied: { type: DataTypes.BOOLEAN, allowNull: false },
        receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'billing_events', timestamps: false },
    );
  }
}
