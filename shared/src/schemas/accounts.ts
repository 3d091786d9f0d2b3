import { z } from 'zod';
import { emailSchema, idSchema, passwordSchema, personNameSchema, timestampSchema, tokenSchema, workspaceNameSchema } from './common';
import { roleSchema } from './role-schema';

export const signupBodySchema = z.object({
  workspaceName: workspaceNameSchema,
  name: personNameSchema,
  email: emailSchema,
  password: passwordSchema,
});
export type SignupBody = z.infer<typeof signupBodySchema>;

export const signinBodySchema = z.object({
  email: emailSchema,
  password: z.string({ message: 'is required' }).min(1, { message: 'is required' }).max(200, { message: 'is too long' }),
});
export type SigninBody = z.infer<typeof signinBodySchema>;

export const passwordResetBodySchema = z.object({ email: emailSchema });
export type PasswordResetBody = z.infer<typeof passwordResetBodySchema>;

export const passwordResetConfirmBodySchema = z.object({ token: tokenSchema, password: passwordSchema });
export type PasswordResetConfirmBody = z.infer<typeof passwordResetConfirmBodySchema>;

export const userSchema = z.object({
  id: idSchema,
  email: z.string(),
  name: z.string(),
  isOperator: z.boolean(),
  createdAt: timestampSchema,
});
export type User = z.infer<typeof userSchema>;

export const workspaceSchema = z.object({
  id: idSchema,
  name: z.string(),
  state: z.enum(['active', 'past_due', 'read_only', 'suspended']),
  /** When a past-due workspace turns read-only (null otherwise). */
  readOnlyFrom: timestampSchema.nullable().optional(),
  /** Why the platform suspended it (null otherwise). */
  suspendedReason: z.string().nullable().optional(),
  createdAt: timestampSchema,
});
export type Workspace = z.infer<typeof workspaceSchema>;

export const membershipSchema = z.object({ workspace: workspaceSchema, role: roleSchema });
export type Membership = z.infer<typeof membershipSchema>;

/** `GET /me`. */
export const meSchema = z.object({ user: userSchema, memberships: z.array(membershipSchema) });
export type Me = z.infer<typeof meSchema>;

/** Sign-up, sign-in, refresh and invitation acceptance answer with a fresh access token. */
export const sessionSchema = z.object({
  accessToken: z.string(),
  expiresIn: z.number().describe('seconds until the access token expires'),
  user: userSchema,
  memberships: z.array(membershipSchema),
  workspace: workspaceSchema.optional().describe('the workspace just created or joined'),
});
export type Session = z.infer<typeof sessionSchema>;
