import { useEffect, useRef, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { staffMemberInputSchema, type StaffMemberInput } from '@fryline/schemas';
import { putFieldErrors } from '@fryline/ui/api-client';
import { useAddStaff } from '../api/use-add-staff';
import { roleLabels, roleNowMessage, roleSummaries, staffRoles } from '../model/roles';

type AddStaffValues = z.input<typeof staffMemberInputSchema>;

const blank: AddStaffValues = { email: '', name: '', role: 'counter' };

function FieldError({ id, message }: { id: string; message: string | undefined }) {
  if (!message) return null;
  return (
    <p id={id} className="field-error">
      {message}
    </p>
  );
}

/** Gives an e-mail address a staff role; the person signs in with it the usual way. */
export function AddStaffForm() {
  const add = useAddStaff();
  const form = useForm<AddStaffValues, unknown, StaffMemberInput>({
    resolver: zodResolver(staffMemberInputSchema),
    defaultValues: blank,
  });
  const { errors } = form.formState;
  const [message, setMessage] = useState<{ ok: boolean; text: string } | null>(null);
  const messageRef = useRef<HTMLParagraphElement>(null);
  const role = form.watch('role');

  useEffect(() => {
    if (message) messageRef.current?.focus();
  }, [message]);

  const submit = form.handleSubmit((body) => {
    setMessage(null);
    add.mutate(body, {
      onSuccess: (member) => {
        form.reset(blank);
        setMessage({ ok: true, text: roleNowMessage(member) });
      },
      onError: (error) => {
        const left = putFieldErrors(error, form.setError, ['email', 'name', 'role'] as const);
        if (left.length > 0) setMessage({ ok: false, text: left.join(' ') });
      },
    });
  });

  const aria = (field: 'email' | 'name' | 'role', help?: string) => ({
    'aria-invalid': errors[field] ? true : undefined,
    'aria-describedby': [help, errors[field] && `add-${field}-error`].filter(Boolean).join(' ') || undefined,
  });

  return (
    <section className="card flex flex-col gap-3">
      <h2 id="add-staff-heading" className="text-xl">
        Add someone
      </h2>
      <p id="add-staff-help" className="text-muted">
        They sign in with this e-mail address through the usual sign-in, and get the role you choose. Nothing is
        e-mailed to them: let them know yourself. If the address already has a shop account, that account gets the
        role.
      </p>
      <form onSubmit={(event) => void submit(event)} noValidate className="flex flex-col gap-3" aria-labelledby="add-staff-heading">
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
          <div>
            <label htmlFor="add-email" className="field-label">
              E-mail
            </label>
            <input
              id="add-email"
              type="email"
              autoComplete="off"
              spellCheck={false}
              className="field-input"
              {...aria('email')}
              {...form.register('email')}
            />
            <FieldError id="add-email-error" message={errors.email?.message} />
          </div>
          <div>
            <label htmlFor="add-name" className="field-label">
              Name<span className="font-semibold text-muted"> · optional</span>
            </label>
            <input id="add-name" type="text" autoComplete="off" className="field-input" {...aria('name')} {...form.register('name')} />
            <FieldError id="add-name-error" message={errors.name?.message} />
          </div>
          <div>
            <label htmlFor="add-role" className="field-label">
              Role
            </label>
            <select id="add-role" className="field-input" {...aria('role', 'add-role-help')} {...form.register('role')}>
              {staffRoles.map((value) => (
                <option key={value} value={value}>
                  {roleLabels[value]}
                </option>
              ))}
            </select>
            <p id="add-role-help" className="mt-1 text-sm text-muted">
              {roleLabels[role]}: {roleSummaries[role]}.
            </p>
            <FieldError id="add-role-error" message={errors.role?.message} />
          </div>
        </div>
        {message && (
          <p
            ref={messageRef}
            tabIndex={-1}
            role={message.ok ? 'status' : 'alert'}
            className={`notice ${message.ok ? 'notice-ok' : 'notice-bad'}`}
          >
            {message.text}
          </p>
        )}
        <button type="submit" className="btn btn-primary self-start" disabled={add.isPending}>
          {add.isPending && <span className="spinner" aria-hidden="true" />}
          Add to the staff
        </button>
      </form>
    </section>
  );
}
