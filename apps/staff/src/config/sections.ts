import type { Role } from '@fryline/schemas';

export type StaffRole = Exclude<Role, 'customer'>;

export interface StaffSection {
  /** Path under /staff/. */
  path: string;
  /** The word in the navigation. */
  label: string;
  /** The lowest role that may open it (owner ⊃ baker ⊃ counter). */
  minRole: StaffRole;
  /** One line on what it is for, used on the home pages. */
  summary: string;
}

/** Everything in the staff app besides each role's home, in navigation order. */
export const sections: readonly StaffSection[] = [
  { path: 'pickups', label: 'Pickups', minRole: 'counter', summary: 'Find, check off and hand over orders.' },
  { path: 'production', label: 'Production sheet', minRole: 'baker', summary: 'The next bake\u2019s quantities and schedule.' },
  { path: 'formula', label: 'Formula', minRole: 'baker', summary: 'The dough in baker\u2019s percentages.' },
  { path: 'bake-days', label: 'Bake days', minRole: 'owner', summary: 'Dates, places, windows and capacity.' },
  { path: 'menu', label: 'Menu', minRole: 'owner', summary: 'Flavours, glazes, allergens and prices.' },
  { path: 'equipment', label: 'Equipment', minRole: 'owner', summary: 'What sets each bake day\u2019s capacity.' },
  { path: 'staff', label: 'Staff', minRole: 'owner', summary: 'Who can sign in, and their roles.' },
  { path: 'sales', label: 'Sales', minRole: 'owner', summary: 'Weekly money, units and margin.' },
  { path: 'settings', label: 'Shop settings', minRole: 'owner', summary: 'Name, time zone, tax, holds and refund policy.' },
  { path: 'payment-checks', label: 'Payment checks', minRole: 'owner', summary: 'Payments that didn\u2019t match their order, refunded.' },
  { path: 'audit-log', label: 'Audit log', minRole: 'owner', summary: 'Who changed what, and when.' },
];

export const roleNames: Record<StaffRole, string> = { counter: 'Counter', baker: 'Baker', owner: 'Owner' };
