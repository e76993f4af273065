/**
 * The staff roles as the owner chooses them, and which changes are asked
 * about first: taking away someone's access, or an owner's rights.
 */
import type { StaffMemberView } from '@fryline/schemas';

export type StaffRole = StaffMemberView['role'];

/** A staff role, or 'customer': no staff access any more. */
export type RoleChoice = StaffRole | 'customer';

export const roleLabels: Record<StaffRole, string> = { counter: 'Counter', baker: 'Baker', owner: 'Owner' };

/** What each role may do, in a line. */
export const roleSummaries: Record<StaffRole, string> = {
  counter: 'the pickup list',
  baker: 'the production sheet and formula, and the pickup list',
  owner: 'everything: bake days, menu, equipment, staff, sales and refunds',
};

export const staffRoles: readonly StaffRole[] = ['counter', 'baker', 'owner'];

export const REMOVE_ACCESS_LABEL = 'Remove staff access';

/** The role select's options: the three roles, then taking access away. */
export const roleChoices: ReadonlyArray<{ value: RoleChoice; label: string }> = [
  ...staffRoles.map((role) => ({ value: role, label: roleLabels[role] })),
  { value: 'customer', label: REMOVE_ACCESS_LABEL },
];

/** How a person is shown: their name, or their address when they have not given one. */
export function displayName(member: Pick<StaffMemberView, 'name' | 'email'>): string {
  return member.name.trim() || member.email;
}

export interface Confirmation {
  question: string;
  /** The button that goes ahead. */
  action: string;
}

/**
 * What to ask before a change that takes rights away (removing access, or
 * an owner becoming counter or baker); null when the change needs no asking.
 */
export function confirmationFor(member: Pick<StaffMemberView, 'name' | 'email' | 'role'>, to: RoleChoice): Confirmation | null {
  const name = displayName(member);
  if (to === 'customer') {
    return {
      question: `Remove staff access for ${name}? They will no longer be able to open the staff pages. Any shop account they have stays.`,
      action: 'Remove access',
    };
  }
  if (member.role === 'owner' && to !== 'owner') {
    return {
      question: `Make ${name} a ${roleLabels[to].toLowerCase()}? They will no longer be an owner, so they lose the setup pages, staff, sales and refunds.`,
      action: `Make ${roleLabels[to].toLowerCase()}`,
    };
  }
  return null;
}

/** What the page says after someone was added or given a new role. */
export function roleNowMessage(member: StaffMemberView): string {
  const role = member.role === 'owner' ? 'an owner' : `a ${roleLabels[member.role].toLowerCase()}`;
  const when = member.signedIn
    ? 'They can open the staff pages now.'
    : `We have e-mailed ${member.email} an invitation; the role takes effect when they first sign in with it.`;
  return `${displayName(member)} is now ${role}. ${when}`;
}
