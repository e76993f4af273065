// Role rules without zod, so a front end that only checks roles stays small.

export const roles = ['customer', 'counter', 'baker', 'owner'] as const;
export type Role = (typeof roles)[number];

/** Staff roles nest: owner ⊃ baker ⊃ counter. A customer holds no staff rights. */
const staffRank: Record<Role, number> = { customer: 0, counter: 1, baker: 2, owner: 3 };

export function hasRole(role: Role, atLeast: Exclude<Role, 'customer'>): boolean {
  return staffRank[role] >= staffRank[atLeast];
}
