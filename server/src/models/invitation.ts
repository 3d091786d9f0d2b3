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
import type { Invitation as InvitationDto, Role } from '@tumblewise/shared';
import type { User } from './user';
import type { Workspace } from './workspace';

/** An e-mailed offer to join a workspace with a role. The token is stored as its SHA-256 only. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<string>;
  declare workspaceId: ForeignKey<Workspace['id']>;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare status: CreationOptional<'pending' | 'accepted' | 'revoked' | 'expired'>;
  declare invitedById: ForeignKey<User['id']> | null;
  declare acceptedById: ForeignKey<User['id']> | null;
  declare expiresAt: Date;
  declare delivery: CreationOptional<'sent' | 'not_sent'>;
  declare deliveryError: CreationOptional<string | null>;
  declare lastSentAt: CreationOptional<Date | null>;
  declare acceptedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare invitedBy?: NonAttribute<User | null>;
  declare workspace?: NonAttribute<Workspace>;

  static initModel(sequelize: Sequelize): void {
    Invitation.init(
      {
        id: { type: DataTypes.UUID, primaryKey: true, defaultValue: DataTypes.UUIDV4 },
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.STRING(20), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'pending' },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        delivery: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'not_sent' },
        deliveryError: { type: DataTypes.STRING(500), allowNull: true },
        lastSentAt: { type: DataTypes.DATE, allowNull: true },
        acceptedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'invitations' },
    );
  }

  /** Pending but past its expiry counts as expired. */
  effectiveStatus(): InvitationDto['status'] {
    if (this.status === 'pending' && this.expiresAt.getTime() <= Date.now()) return 'expired';
    return this.status;
  }

  toDto(): InvitationDto {
    return {
      id: this.id,
      email: this.email,
      role: this.role,
      status: this.effectiveStatus(),
      delivery: this.delivery,
      deliveryError: this.deliveryError ?? null,
      invitedBy: this.invitedBy ? { id: this.invitedBy.id, name: this.invitedBy.name } : null,
      expiresAt: this.expiresAt.toISOString(),
      createdAt: this.createdAt.toISOString(),
      lastSentAt: this.lastSentAt ? this.lastSentAt.toISOString() : null,
    };
  }
}
