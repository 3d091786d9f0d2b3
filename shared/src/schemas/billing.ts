import { z } from 'zod';
import { idSchema, timestampSchema } from './common';

/** A plan of the catalogue (server config). Prices in the currency's minor unit (cents). */
export const planSchema = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string(),
  pricePerSeatMonthly: z.number().int().describe('minor units, e.g. cents'),
  currency: z.string(),
  trialDays: z.number().int(),
});
export type Plan = z.infer<typeof planSchema>;

export const SUBSCRIPTION_STATUSES = ['trialing', 'active', 'past_due', 'canceled', 'unpaid', 'incomplete'] as const;

/** `GET /workspaces/:id/billing`. */
export const billingSchema = z.object({
  plans: z.array(planSchema),
  plan: planSchema.nullable().describe('null before the first subscription'),
  seats: z.object({
    bought: z.number().int().describe('seats of the subscription, or the evaluation allowance before it'),
    members: z.number().int(),
    pendingInvitations: z.number().int(),
    available: z.number().int(),
    evaluationAllowance: z.boolean().describe('true while the workspace has no subscription yet'),
  }),
  subscription: z
    .object({
      status: z.enum(SUBSCRIPTION_STATUSES),
      cancelAtPeriodEnd: z.boolean(),
      currentPeriodEnd: timestampSchema.nullable(),
      trialEndsAt: timestampSchema.nullable(),
    })
    .nullable(),
  paymentMethod: z
    .object({ brand: z.string(), last4: z.string(), expMonth: z.number().nullable(), expYear: z.number().nullable() })
    .nullable(),
  workspaceState: z.enum(['active', 'past_due', 'read_only', 'suspended']),
  pastDueSince: timestampSchema.nullable(),
  readOnlyFrom: timestampSchema.nullable().describe('when a past-due workspace becomes read-only'),
});
export type Billing = z.infer<typeof billingSchema>;

const seats = z
  .number({ message: 'must be a number' })
  .int({ message: 'must be a whole number' })
  .min(1, { message: 'must be at least 1' })
  .max(1000, { message: 'must be at most 1000' });
/** Card tokens come from the payment provider's card form (locally the fake's test tokens: tok_visa, tok_chargeDeclined …). */
const cardToken = z
  .string({ message: 'is required' })
  .trim()
  .regex(/^tok_[A-Za-z0-9_]{1,100}$/, { message: 'must be a card token from the card form' });

export const startSubscriptionBodySchema = z.strictObject({ planId: z.string().max(40).optional(), seats, cardToken });
export const changeSeatsBodySchema = z.strictObject({ seats });
export const paymentMethodBodySchema = z.strictObject({ cardToken });

export const invoiceSchema = z.object({
  id: z.string(),
  number: z.string().nullable(),
  createdAt: timestampSchema,
  amountDue: z.number().int(),
  amountPaid: z.number().int(),
  currency: z.string(),
  status: z.enum(['draft', 'open', 'paid', 'void', 'uncollectible']),
  description: z.string(),
  documentUrl: z.string().nullable(),
});
export type Invoice = z.infer<typeof invoiceSchema>;

/** Workspace settings (admin app). */
export const DISPLAY_LENGTH_UNITS = ['mm', 'cm', 'in'] as const;
export const DISPLAY_MASS_UNITS = ['g', 'kg', 'oz'] as const;
export const DISPLAY_INERTIA_UNITS = ['g·cm²', 'kg·cm²', 'kg·m²', 'oz·in²'] as const;
export const workspaceSettingsSchema = z.object({
  id: idSchema,
  name: z.string(),
  displayUnits: z.object({
    length: z.enum(DISPLAY_LENGTH_UNITS),
    mass: z.enum(DISPLAY_MASS_UNITS),
    inertia: z.enum(DISPLAY_INERTIA_UNITS),
  }),
  defaultTolerances: z.object({ density: z.number().describe('relative'), size: z.number().describe('m') }),
});
export type WorkspaceSettings = z.infer<typeof workspaceSettingsSchema>;
export const updateWorkspaceSettingsBodySchema = z.strictObject({
  name: z
    .string()
    .trim()
    .min(2, { message: 'must be at least 2 characters' })
    .max(80, { message: 'must be at most 80 characters' })
    .optional(),
  displayUnits: z
    .strictObject({
      length: z.enum(DISPLAY_LENGTH_UNITS, { message: `must be one of ${DISPLAY_LENGTH_UNITS.join(', ')}` }),
      mass: z.enum(DISPLAY_MASS_UNITS, { message: `must be one of ${DISPLAY_MASS_UNITS.join(', ')}` }),
      inertia: z.enum(DISPLAY_INERTIA_UNITS, { message: `must be one of ${DISPLAY_INERTIA_UNITS.join(', ')}` }),
    })
    .optional(),
  defaultTolerances: z
    .strictObject({
      density: z
        .number({ message: 'must be a number' })
        .min(0, { message: 'must not be negative' })
        .max(0.5, { message: 'must be at most 0.5' }),
      size: z
        .number({ message: 'must be a number' })
        .min(0, { message: 'must not be negative' })
        .max(0.01, { message: 'must be at most 0.01 m' }),
    })
    .optional(),
});

/** Operator pages: every workspace of the platform. */
export const operatorWorkspaceSchema = z.object({
  id: idSchema,
  name: z.string(),
  createdAt: timestampSchema,
  plan: z.string().nullable(),
  seats: z.number().int(),
  members: z.number().int(),
  state: z.enum(['active', 'past_due', 'read_only', 'suspended']),
  subscriptionStatus: z.string().nullable(),
  lastActivityAt: timestampSchema.nullable(),
  suspendedReason: z.string().nullable(),
});
export type OperatorWorkspace = z.infer<typeof operatorWorkspaceSchema>;
export const operatorWorkspacesQuerySchema = z.object({
  q: z.string().trim().max(80).optional(),
  state: z.enum(['active', 'past_due', 'read_only', 'suspended']).optional(),
  sort: z.enum(['name', 'createdAt', 'members', 'seats', 'lastActivityAt']).default('createdAt'),
  order: z.enum(['asc', 'desc']).default('desc'),
});
export const suspensionBodySchema = z.strictObject({
  reason: z
    .string({ message: 'is required' })
    .trim()
    .min(3, { message: 'must say why (at least 3 characters)' })
    .max(500, { message: 'must be at most 500 characters' }),
});
