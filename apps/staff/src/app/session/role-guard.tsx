import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { roleNames, type StaffRole } from '../../config/sections';
import { useCan } from './staff-member';

/** Renders the page only for roles at or above `minRole`; others get a plain explanation. */
export function RoleGuard({ minRole, children }: { minRole: StaffRole; children: ReactNode }) {
  if (useCan(minRole)) return children;
  return (
    <section className="flex flex-col items-start gap-3">
      <h1 tabIndex={-1} className="text-2xl">
        Not part of your role
      </h1>
      <p>
        This page is for the {roleNames[minRole].toLowerCase()}
        {minRole !== 'owner' && ' and the roles above it'}. Ask the owner if you need it.
      </p>
      <Link className="btn btn-primary" to="/">
        Back to your home page
      </Link>
    </section>
  );
}
