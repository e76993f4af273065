import { useState } from 'react';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type { CounterSettings } from '@fryline/schemas';
import { api, errorMessage, isApiError } from '@fryline/ui/api-client';
import { counterQueries } from '../api/counter-queries';

/** The owner's two counter settings: grace before a no-show, and how long a hand-over can be undone. */
export function CounterSettingsForm() {
  const settings = useQuery(counterQueries.settings());
  const queryClient = useQueryClient();
  const [draft, setDraft] = useState<{ grace: string; undo: string } | null>(null);
  const save = useMutation({
    mutationFn: (body: CounterSettings) => api.put<CounterSettings>('/api/counter/settings', body),
    onSuccess: (saved) => {
      queryClient.setQueryData(counterQueries.settings().queryKey, saved);
      void queryClient.invalidateQueries({ queryKey: counterQueries.root });
    },
  });
  if (!settings.data) return null;
  const values = draft ?? { grace: String(settings.data.noShowGraceMinutes), undo: String(settings.data.handOverUndoSeconds) };
  const fields = isApiError(save.error) ? save.error.fieldErrors : {};
  return (
    <details className="card">
      <summary className="cursor-pointer text-lg font-extrabold">Counter settings (owner)</summary>
      <form
        className="mt-3 flex flex-col gap-3"
        onSubmit={(e) => {
          e.preventDefault();
          save.mutate({ noShowGraceMinutes: Number(values.grace), handOverUndoSeconds: Number(values.undo) }, { onSuccess: () => setDraft(null) });
        }}
      >
        <label className="flex flex-col gap-1">
          <span className="field-label">Grace after a pickup window before a no-show (minutes)</span>
          <input className="field-input min-h-12" inputMode="numeric" value={values.grace} onChange={(e) => setDraft({ ...values, grace: e.target.value })} aria-invalid={fields.noShowGraceMinutes ? true : undefined} />
          {fields.noShowGraceMinutes && <span className="field-error">{fields.noShowGraceMinutes}</span>}
        </label>
        <label className="flex flex-col gap-1">
          <span className="field-label">Time to undo a hand-over (seconds)</span>
          <input className="field-input min-h-12" inputMode="numeric" value={values.undo} onChange={(e) => setDraft({ ...values, undo: e.target.value })} aria-invalid={fields.handOverUndoSeconds ? true : undefined} />
          {fields.handOverUndoSeconds && <span className="field-error">{fields.handOverUndoSeconds}</span>}
        </label>
        {save.isError && Object.keys(fields).length === 0 && (
          <p role="alert" className="field-error">
            {errorMessage(save.error)}
          </p>
        )}
        {save.isSuccess && !draft && (
          <p role="status" className="notice notice-ok">
            Saved.
          </p>
        )}
        <button type="submit" className="btn btn-primary min-h-12 self-start" disabled={save.isPending}>
          Save counter settings
        </button>
      </form>
    </details>
  );
}
