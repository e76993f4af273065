import { z } from 'zod';
import { roles } from './role-rules.js';

export { roles, hasRole, type Role } from './role-rules.js';

export const roleSchema = z.enum(roles);

export const meSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type Me = z.infer<typeof meSchema>;
