import { useEffect, useId, useRef, useState } from 'react';
import type { StaffMemberView } from '@fryline/schemas';
import { errorMessage } from '@fryline/ui/api-client';
import { useChangeRole } from '../api/use-change-role';
import { confirmationFor, displayName, roleChoices, roleLabels, roleNowMessage, type RoleChoice } from '../model/roles';

interface MemberCardProps {
  member: StaffMemberView;
  /** The signed-in owner's own card: no role form (no one can lower their own role). */
  isYou: boolean;
  /** Their staff access was removed: the card is about to leave the list. */
  onRemoved: (member: StaffMemberView) => void;
}

function SignedInBadge({ signedIn }: { signedIn: boolean }) {
  return signedIn ? <span className="badge badge-ok">Has signed in</span> : <span className="badge badge-warn">Not signed in yet</span>;
}

/** One person on the staff: name, address, whether they have signed in, and their role. */
export function MemberCard({ member, isYou, onRemoved }: MemberCardProps) {
  const change = useChangeRole();
  const [choice, setChoice] = useState<RoleChoice>(member.role);
  const [confirming, setConfirming] = useState(false);
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const confirmRef = useRef<HTMLDivElement>(null);
  const selectRef = useRef<HTMLSelectElement>(null);
  const id = useId();
  const name = displayName(member);
  const confirmation = confirmationFor(member, choice);

  useEffect(() => {
    if (confirming) confirmRef.current?.focus();
  }, [confirming]);

  const send = () => {
    setMessage(null);
    change.mutate(
      { id: member.id, role: choice },
      {
        onSuccess: (updated) => {
          setConfirming(false);
          if (updated) setMessage({ ok: true, text: roleNowMessage(updated) });
          else onRemoved(member);
        },
        onError: (error) => {
          setConfirming(false);
          setChoice(member.role);
          setMessage({ ok: false, text: errorMessage(error) });
          selectRef.current?.focus();
        },
      },
    );
  };

  return (
    <article aria-labelledby={`${id}-name`} className="card flex flex-col gap-3 p-4">
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div className="min-w-0">
          <h3 id={`${id}-name`} className="text-lg leading-tight font-extrabold break-all">
            {name}
            {isYou && <span className="font-semibold text-muted"> (you)</span>}
          </h3>
          {member.name.trim() !== '' && <p className="text-sm break-all text-muted">{member.email}</p>}
        </div>
        <SignedInBadge signedIn={member.signedIn} />
      </div>

      {isYou ? (
        <p>
          <span className="font-extrabold">{roleLabels[member.role]}.</span>{' '}
          <span className="text-muted">Only another owner can change your role.</span>
        </p>
      ) : (
        <form
          className="flex flex-wrap items-end gap-3"
          noValidate
          onSubmit={(event) => {
            event.preventDefault();
            if (choice === member.role) return;
            if (confirmation) setConfirming(true);
            else send();
          }}
        >
          <div className="min-w-44 flex-1 sm:flex-none">
            <label htmlFor={`${id}-role`} className="field-label">
              Role<span className="sr-only"> for {name}</span>
            </label>
            <select
              ref={selectRef}
              id={`${id}-role`}
              className="field-input"
              value={choice}
              onChange={(event) => {
                setChoice(event.target.value as RoleChoice);
                setConfirming(false);
                setMessage(null);
              }}
            >
              {roleChoices.map((option) => (
                <option key={option.value} value={option.value}>
                  {option.label}
                </option>
              ))}
            </select>
          </div>
          <button type="submit" className="btn btn-quiet btn-small" disabled={change.isPending || choice === member.role}>
            {change.isPending && <span className="spinner" aria-hidden="true" />}
            Save role<span className="sr-only"> for {name}</span>
          </button>
        </form>
      )}

      {confirming && confirmation && (
        <div ref={confirmRef} tabIndex={-1} role="alert" className="notice notice-warn flex flex-col gap-2">
          <p>{confirmation.question}</p>
          <div className="flex flex-wrap gap-2">
            <button type="button" className="btn btn-danger btn-small" disabled={change.isPending} onClick={send}>
              {confirmation.action}
              <span className="sr-only"> for {name}</span>
            </button>
            <button
              type="button"
              className="btn btn-quiet btn-small"
              disabled={change.isPending}
              onClick={() => {
                setConfirming(false);
                setChoice(member.role);
                selectRef.current?.focus();
              }}
            >
              Keep as is
            </button>
          </div>
        </div>
      )}

      {message && (
        <p role={message.ok ? 'status' : 'alert'} className={`notice ${message.ok ? 'notice-ok' : 'notice-bad'}`}>
          {message.text}
        </p>
      )}
    </article>
  );
}
