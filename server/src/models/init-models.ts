import type { Sequelize } from 'sequelize';
import { AuditEvent } from './audit-event';
import { BillingEvent } from './billing-event';
import { Invitation } from './invitation';
import { Membership } from './membership';
import { PasswordReset } from './password-reset';
import { Material } from './material';
import { Measurement } from './measurement';
import { Mesh } from './mesh';
import { Part } from './part';
import { Project } from './project';
import { ReviewEntry } from './review-entry';
import { ScatterStudy } from './scatter-study';
import { Variant } from './variant';
import { RefreshToken } from './refresh-token';
import { SignInSession } from './sign-in-session';
import { User } from './user';
import { Workspace } from './workspace';

/** Initialises every model on the instance and wires the associations. */
export function initModels(sequelize: Sequelize): void {
  for (const model of [
    User,
    Workspace,
    Membership,
    SignInSession,
    RefreshToken,
    PasswordReset,
    Invitation,
    AuditEvent,
    Project,
    Material,
    Part,
    Variant,
    Mesh,
    ReviewEntry,
    Measurement,
    ScatterStudy,
    BillingEvent,
  ]) {
    model.initModel(sequelize);
  }
  Workspace.hasMany(Membership, { foreignKey: 'workspaceId' });
  Membership.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  User.hasMany(Membership, { foreignKey: 'userId' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  SignInSession.belongsTo(User, { foreignKey: 'userId' });
  RefreshToken.belongsTo(SignInSession, { foreignKey: 'sessionId', as: 'session' });
  PasswordReset.belongsTo(User, { foreignKey: 'userId' });
  Invitation.belongsTo(Workspace, { foreignKey: 'workspaceId', as: 'workspace' });
  Invitation.belongsTo(User, { foreignKey: 'invitedById', as: 'invitedBy' });
  Invitation.belongsTo(User, { foreignKey: 'acceptedById', as: 'acceptedBy' });
  AuditEvent.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
  AuditEvent.belongsTo(Workspace, { foreignKey: 'workspaceId' });
  Project.belongsTo(Workspace, { foreignKey: 'workspaceId' });
  Project.belongsTo(User, { foreignKey: 'createdById', as: 'createdBy' });
  Project.hasMany(Part, { foreignKey: 'projectId' });
  Part.belongsTo(Project, { foreignKey: 'projectId' });
  Part.hasMany(Variant, { foreignKey: 'partId', as: 'variants' });
  Variant.belongsTo(Part, { foreignKey: 'partId', as: 'part' });
  Variant.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  ReviewEntry.belongsTo(User, { foreignKey: 'authorId', as: 'author' });
  ReviewEntry.belongsTo(User, { foreignKey: 'reviewerId', as: 'reviewer' });
  ReviewEntry.belongsTo(Variant, { foreignKey: 'variantId' });
  Measurement.belongsTo(Variant, { foreignKey: 'variantId' });
  ScatterStudy.belongsTo(Variant, { foreignKey: 'variantId' });
}

export {
  AuditEvent,
  BillingEvent,
  Invitation,
  Material,
  Measurement,
  Membership,
  Mesh,
  Part,
  PasswordReset,
  Project,
  RefreshToken,
  ReviewEntry,
  ScatterStudy,
  SignInSession,
  User,
  Variant,
  Workspace,
};
