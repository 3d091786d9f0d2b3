import {
  DataTypes,
  Model,
  type CreationOptional,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { User } from './user';

/**
 * One sign-in: the family of refresh tokens rotated from it. Revoking it ends the sign-in on every
 * server process at once (access tokens carry its id and are checked against it).
 */
export class SignInSession extends Model<InferAttributes<SignInSession>, InferCreationAttributes<SignInSession>> {
  declare id: CreationOptional<string>;
  declare userId: ForeignKey<User['id']>;
  declare revokedAt: Date | null;
  declare revokedReason: string | null;
  declare userAgent: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    SignInSession.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        revokedAt: { type: DataTypes.DATE, allowNull: true },
        revokedReason: { type: DataTypes.STRING(40), allowNull: true },
        userAgent: { type: DataTypes.STRING(300), allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sign_in_sessions' },
    );
  }
}
