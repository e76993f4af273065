import { useWaitingChanges } from '../api/counter-mutations';
import { StatusIcon } from './status-icon';
import { useOnline } from './use-online';

/** In the header: no connection, and how many counter changes are kept on this device waiting to be sent. */
export function WaitingToSend() {
  const waiting = useWaitingChanges();
  const online = useOnline();
  if (online && waiting.length === 0) return null;
  return (
    <span role="status" aria-live="polite" className="flex items-center gap-2">
      {!online && (
        <span className="badge badge-warn flex items-center gap-1">
          <StatusIcon name="offline" className="h-4 w-4" /> Offline
        </span>
      )}
      {waiting.length > 0 && (
        <span className="badge badge-plum flex items-center gap-1" data-testid="waiting-count">
          <StatusIcon name="sending" className="h-4 w-4" /> {waiting.length} waiting to send
        </span>
      )}
    </span>
  );
}
