import { z } from 'zod';

export const roles = ['customer', 'counter', 'baker', 'owner'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** Staff roles nest: owner ⊃ baker ⊃ counter. A customer holds no staff rights. */
const staffRank: Record<Role, number> = { customer: 0, counter: 1, baker: 2, owner: 3 };

export function hasRole(role: Role, atLeast: Exclude<Role, 'customer'>): boolean {
  return staffRank[role] >= staffRank[atLeast];
}

export const meSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type Me = z.infer<typeof meSchema>;
