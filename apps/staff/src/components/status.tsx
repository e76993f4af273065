import { errorMessage } from '../lib/api-client';

export function LoadingState({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="flex items-center gap-3 py-6 text-muted">
      <span className="spinner" aria-hidden="true" />
      {label}
    </p>
  );
}

export function ErrorState({ error, title, onRetry }: { error: unknown; title: string; onRetry?: () => void }) {
  return (
    <div role="alert" className="notice notice-bad">
      <p className="font-extrabold">{title}</p>
      <p>{errorMessage(error)}</p>
      {onRetry && (
        <button type="button" className="btn btn-quiet btn-small mt-3 bg-white" onClick={onRetry}>
          Try again
        </button>
      )}
    </div>
  );
}
