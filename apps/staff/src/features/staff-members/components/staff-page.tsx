import { useEffect, useRef, useState } from 'react';
import { useQuery } from '@tanstack/react-query';
import type { StaffMemberView } from '@fryline/schemas';
import { PageFrame } from '../../../components/page-frame';
import { ErrorState, LoadingState } from '@fryline/ui';
import { useStaffMember } from '../../../app/session/staff-member';
import { staffQueries } from '../api/staff-queries';
import { displayName } from '../model/roles';
import { AddStaffForm } from './add-staff-form';
import { MemberCard } from './member-card';

/** `/staff/staff`: who can sign in to the staff pages, their roles, and adding someone. */
export function StaffPage() {
  const me = useStaffMember();
  const members = useQuery(staffQueries.all());
  const [removed, setRemoved] = useState<string | null>(null);
  const removedRef = useRef<HTMLParagraphElement>(null);

  // The card that was acted on has left the list: start again from the message.
  useEffect(() => {
    if (removed) removedRef.current?.focus();
  }, [removed]);

  const onRemoved = (member: StaffMemberView) => setRemoved(`Removed staff access for ${displayName(member)}.`);

  return (
    <PageFrame eyebrow="Owner" title="Staff" intro="Who can sign in to the staff pages, and what each person may do.">
      <section aria-labelledby="team-heading" className="flex flex-col gap-3">
        <h2 id="team-heading" className="text-xl">
          The team
        </h2>
        {removed && (
          <p ref={removedRef} tabIndex={-1} role="status" className="notice notice-ok">
            {removed}
          </p>
        )}
        {members.isPending ? (
          <LoadingState label="Loading the staff…" />
        ) : members.isError ? (
          <ErrorState error={members.error} title="The staff could not be loaded" onRetry={() => void members.refetch()} />
        ) : (
          <ul className="grid gap-3 md:grid-cols-2">
            {members.data.map((member) => (
              <li key={member.id}>
                <MemberCard member={member} isYou={member.id === me.id} onRemoved={onRemoved} />
              </li>
            ))}
          </ul>
        )}
      </section>
      <AddStaffForm />
    </PageFrame>
  );
}
