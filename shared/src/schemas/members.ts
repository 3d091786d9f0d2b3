import { z } from 'zod';
import { emailSchema, idSchema, pageQuerySchema, timestampSchema, tokenSchema, personNameSchema, passwordSchema } from './common';
import { roleSchema } from './role-schema';

export const memberSchema = z.object({
  id: idSchema.describe('membership id'),
  userId: idSchema,
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: timestampSchema,
});
export type Member = z.infer<typeof memberSchema>;

export const changeRoleBodySchema = z.object({ role: roleSchema });
export type ChangeRoleBody = z.infer<typeof changeRoleBodySchema>;

export const INVITATION_STATUSES = ['pending', 'accepted', 'revoked', 'expired'] as const;
export const invitationSchema = z.object({
  id: idSchema,
  email: z.string(),
  role: roleSchema,
  status: z.enum(INVITATION_STATUSES),
  delivery: z.enum(['sent', 'not_sent']).describe('whether the e-mail reached the mail server'),
  deliveryError: z.string().nullable(),
  invitedBy: z.object({ id: idSchema, name: z.string() }).nullable(),
  expiresAt: timestampSchema,
  createdAt: timestampSchema,
  lastSentAt: timestampSchema.nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;

export const createInvitationBodySchema = z.object({ email: emailSchema, role: roleSchema });
export type CreateInvitationBody = z.infer<typeof createInvitationBodySchema>;

export const acceptInvitationBodySchema = z.object({
  token: tokenSchema,
  name: personNameSchema.optional(),
  password: passwordSchema.optional(),
});
export type AcceptInvitationBody = z.infer<typeof acceptInvitationBodySchema>;

/** What the accept page shows before the user decides (`GET /invitations/preview?token=`). */
export const invitationPreviewSchema = z.object({
  workspaceName: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string().nullable(),
  accountExists: z.boolean().describe('true when the address already has an account: sign in to accept'),
  expiresAt: timestampSchema,
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;
export const invitationPreviewQuerySchema = z.object({ token: tokenSchema });

export const AUDIT_ACTIONS = [
  'workspace.created',
  'member.role_changed',
  'member.removed',
  'invitation.created',
  'invitation.resent',
  'invitation.revoked',
  'invitation.accepted',
  'invitation.delivery_failed',
] as const;

export const auditEventSchema = z.object({
  id: idSchema,
  at: timestampSchema,
  action: z.string(),
  actor: z.object({ id: idSchema, name: z.string(), email: z.string() }).nullable(),
  targetType: z.string(),
  targetId: z.string().nullable(),
  targetLabel: z.string().nullable(),
  details: z.record(z.string(), z.unknown()),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

export const auditQuerySchema = pageQuerySchema.extend({
  action: z
    .string()
    .max(80)
    .regex(/^[a-z_.]+$/, { message: 'must be an action name' })
    .optional(),
  actor: idSchema.optional(),
  from: z.iso.datetime({ message: 'must be an ISO date-time', offset: true }).optional(),
  to: z.iso.datetime({ message: 'must be an ISO date-time', offset: true }).optional(),
});
export type AuditQuery = z.infer<typeof auditQuerySchema>;
