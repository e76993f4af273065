import { createContext, useContext, type ReactNode } from 'react';
import { hasRole, type Me } from '@fryline/schemas';
import type { StaffRole } from '../../config/sections';

export type StaffMember = Me & { role: StaffRole };

const StaffMemberContext = createContext<StaffMember | null>(null);

export function StaffMemberProvider({ member, children }: { member: StaffMember; children: ReactNode }) {
  return <StaffMemberContext.Provider value={member}>{children}</StaffMemberContext.Provider>;
}

/** The signed-in staff member; only rendered below the staff gate, which has checked the role. */
export function useStaffMember(): StaffMember {
  const member = useContext(StaffMemberContext);
  if (!member) throw new Error('useStaffMember needs a StaffMemberProvider above it');
  return member;
}

export function useCan(minRole: StaffRole): boolean {
  return hasRole(useStaffMember().role, minRole);
}
