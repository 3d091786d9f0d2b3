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
import type { Member, Role } from '@tumblewise/shared';
import type { User } from './user';
import type { Workspace } from './workspace';

/** A user's role inside one workspace. */
export class Membership extends Model<InferAttributes<Membership>, InferCreationAttributes<Membership>> {
  declare id: CreationOptional<string>;
  declare workspaceId: ForeignKey<Workspace['id']>;
  declare userId: ForeignKey<User['id']>;
  declare role: Role;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;
  declare workspace?: NonAttribute<Workspace>;

  static initModel(sequelize: Sequelize): void {
    Membership.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        role: { type: DataTypes.STRING(20), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'memberships' },
    );
  }

  /** Needs `user` loaded. */
  toMemberDto(): Member {
    if (!this.user) throw new Error('Membership.toMemberDto needs the user included');
    return {
      id: this.id,
      userId: this.userId,
      name: this.user.name,
      email: this.user.email,
      role: this.role,
      joinedAt: this.createdAt.toISOString(),
    };
  }
}
