import { useState, type FormEvent } from 'react';
import { errorMessage } from '@fryline/ui/api-client';
import { useSubscribe } from '../api/use-announcements';

/** "Tell me about new bake days": an e-mail address, then a confirmation link by e-mail (double opt-in). */
export function NewsSignup({ defaultEmail = '' }: { defaultEmail?: string }) {
  const subscribe = useSubscribe();
  const [email, setEmail] = useState(defaultEmail);
  const [problem, setProblem] = useState<string | null>(null);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email.trim())) {
      setProblem('Type an e-mail address, like name@example.com.');
      return;
    }
    setProblem(null);
    subscribe.mutate(email.trim(), { onError: (error) => setProblem(errorMessage(error)) });
  };

  return (
    <section aria-labelledby="news-heading" className="card flex flex-col gap-3">
      <h2 id="news-heading" className="text-2xl">
        Hear about new bake days
      </h2>
      {subscribe.isSuccess ? (
        <p role="status" className="notice notice-ok">
          Check your inbox: we sent a link to {email.trim()}. Nothing more comes until you open it.
        </p>
      ) : (
        <form onSubmit={submit} noValidate className="flex flex-col gap-2">
          <p>One e-mail when a new bake day opens for pre-orders, with its date and place. Leave with one click whenever you like.</p>
          <label htmlFor="news-email" className="font-extrabold">
            Your e-mail
          </label>
          <div className="flex flex-wrap gap-2">
            <input
              id="news-email"
              type="email"
              autoComplete="email"
              className="field-input max-w-sm"
              value={email}
              onChange={(e) => setEmail(e.target.value)}
              aria-invalid={problem ? true : undefined}
              aria-describedby={problem ? 'news-error' : undefined}
            />
            <button type="submit" className="btn btn-primary" disabled={subscribe.isPending}>
              {subscribe.isPending ? 'Sending…' : 'Tell me'}
            </button>
          </div>
          {problem && (
            <p id="news-error" className="field-error">
              {problem}
            </p>
          )}
        </form>
      )}
    </section>
  );
}
