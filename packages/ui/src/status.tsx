import type { ReactNode } from 'react';
import { errorMessage } from './api-client';

/** A loading line with a spinner, announced politely. */
export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="flex items-center gap-3 py-8 text-muted">
      <span className="spinner" aria-hidden="true" />
      {label}
    </p>
  );
}

interface ErrorStateProps {
  error: unknown;
  title?: string;
  onRetry?: () => void;
  children?: ReactNode;
}

/** What went wrong while loading, in words a person can act on, with an optional retry. */
export function ErrorState({ error, title = 'We could not load this', onRetry, children }: ErrorStateProps) {
  return (
    <div role="alert" className="notice notice-bad my-4">
      <p className="font-extrabold">{title}</p>
      <p>{errorMessage(error)}</p>
      {children}
      {onRetry && (
        <button type="button" className="btn btn-quiet btn-small mt-3 bg-white" onClick={onRetry}>
          Try again
        </button>
      )}
    </div>
  );
}

type Tone = 'info' | 'warn' | 'bad' | 'ok';
const toneClass: Record<Tone, string> = { info: '', warn: 'notice-warn', bad: 'notice-bad', ok: 'notice-ok' };

export function Notice({ tone = 'info', children, className = '' }: { tone?: Tone; children: ReactNode; className?: string }) {
  return <div className={`notice ${toneClass[tone]} ${className}`}>{children}</div>;
}
