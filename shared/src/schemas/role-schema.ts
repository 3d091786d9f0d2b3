import { z } from 'zod';
import { ROLES } from './roles';

/** A workspace role in a request body. */
export const roleSchema = z.enum(ROLES, { message: 'must be one of owner, admin, designer, reviewer' });
