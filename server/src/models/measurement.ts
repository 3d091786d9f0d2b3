import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A measured moment of a prototype (kg·m²), as imported from a CSV row. */
export class Measurement extends Model<InferAttributes<Measurement>, InferCreationAttributes<Measurement>> {
  declare id: CreationOptional<string>;
  declare workspaceId: string;
  declare variantId: string;
  declare axis: string;
  declare value: number;
  declare enteredValue: number;
  declare enteredUnit: string;
  declare method: string;
  declare createdById: string | null;
  /** The import the row came in with (rows of one CSV share it); null for rows from before imports were recorded. */
  declare importId: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Measurement.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        workspaceId: { type: DataTypes.UUID, allowNull: false },
        variantId: { type: DataTypes.UUID, allowNull: false },
        axis: { type: DataTypes.STRING(120), allowNull: false },
        value: { type: DataTypes.DOUBLE, allowNull: false },
        enteredValue: { type: DataTypes.DOUBLE, allowNull: false },
        enteredUnit: { type: DataTypes.STRING(20), allowNull: false },
        method: { type: DataTypes.STRING(200), allowNull: false },
        createdById: { type: DataTypes.UUID, allowNull: true },
        importId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'measurements', updatedAt: false },
    );
  }
}
