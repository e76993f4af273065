import { useEffect, useRef, useState, type FormEvent, type ReactNode } from 'react';
import type { BakeDayEditResult, EditBakeDayInput } from '@fryline/schemas';
import { errorMessage } from '@fryline/ui/api-client';
import { plural } from '@fryline/ui/format';
import { useEditBakeDay } from '../../api/bake-day-edit-queries';

/**
 * Starts a section's inputs again from the server's figures when those
 * change (after a save, or a refetch), but not on every render: the
 * section keeps its message about the save.
 */
export function useServerReset(server: unknown, reset: () => void) {
  const signature = JSON.stringify(server);
  const seen = useRef(signature);
  useEffect(() => {
    if (seen.current === signature) return;
    seen.current = signature;
    reset();
  });
}

/** What a section says after saving: what changed and who was told. */
export function SaveResult({ result }: { result: BakeDayEditResult }) {
  if (result.changes.length === 0) return <p className="notice">Nothing changed.</p>;
  return (
    <div role="status" className="notice notice-ok">
      <p className="font-extrabold">Saved.</p>
      <ul className="list-disc pl-5">
        {result.changes.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
      {result.customersTold > 0 && (
        <p className="mt-1">
          {plural(result.customersTold, 'customer')} with a paid order got an e-mail about it, with a link to pick another window or cancel for
          a full refund.
        </p>
      )}
    </div>
  );
}

/**
 * One part of the bake day with its own Save button: sends only its own
 * fields, shows what changed, or the server's refusal (with its numbers).
 */
export function SectionForm({
  bakeDayId,
  title,
  intro,
  disabled,
  build,
  children,
}: {
  bakeDayId: string;
  title: string;
  intro?: ReactNode;
  disabled?: boolean;
  /** The fields to send, or a message when what is typed can't be sent. */
  build: () => EditBakeDayInput | string;
  children: ReactNode;
}) {
  const edit = useEditBakeDay(bakeDayId);
  const [problem, setProblem] = useState<string | null>(null);
  const [result, setResult] = useState<BakeDayEditResult | null>(null);
  const id = `section-${title.toLowerCase().replace(/[^a-z]+/g, '-')}`;

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const input = build();
    setResult(null);
    if (typeof input === 'string') {
      setProblem(input);
      return;
    }
    setProblem(null);
    edit.mutate(input, { onSuccess: setResult, onError: (error) => setProblem(errorMessage(error)) });
  };

  return (
    <form className="card flex flex-col gap-3" aria-labelledby={id} onSubmit={submit} noValidate>
      <h2 id={id} className="text-xl">
        {title}
      </h2>
      {intro && <p className="text-muted">{intro}</p>}
      <fieldset disabled={disabled || edit.isPending} className="flex flex-col gap-3">
        {children}
      </fieldset>
      {problem && (
        <p role="alert" className="notice notice-bad">
          {problem}
        </p>
      )}
      {result && <SaveResult result={result} />}
      <div>
        <button type="submit" className="btn btn-primary" disabled={disabled || edit.isPending}>
          {edit.isPending ? 'Saving…' : `Save ${title.toLowerCase()}`}
        </button>
      </div>
    </form>
  );
}
