import { dismissConflict, useConflicts } from '../model/conflicts';
import { StatusIcon } from './status-icon';

/** Changes the server turned down after they were made here, each for the counter person to deal with. */
export function ConflictList({ onShow }: { onShow: (orderId: string) => void }) {
  const conflicts = useConflicts();
  if (conflicts.length === 0) return null;
  return (
    <section aria-labelledby="conflicts-heading" className="notice notice-bad flex flex-col gap-3" role="alert">
      <h2 id="conflicts-heading" className="flex items-center gap-2 text-lg">
        <StatusIcon name="late" /> {conflicts.length === 1 ? '1 change could not be made' : `${conflicts.length} changes could not be made`}
      </h2>
      <ul className="flex flex-col gap-3">
        {conflicts.map((c) => (
          <li key={c.id} className="rounded-2xl bg-white p-3" data-testid="conflict">
            <p className="font-extrabold">{c.what}</p>
            <p>{c.reason}</p>
            <div className="mt-2 flex gap-2">
              {c.orderId && (
                <button type="button" className="btn btn-quiet btn-small min-h-11" onClick={() => onShow(c.orderId!)}>
                  Show the order
                </button>
              )}
              <button type="button" className="btn btn-quiet btn-small min-h-11" onClick={() => dismissConflict(c.id)}>
                Dealt with
              </button>
            </div>
          </li>
        ))}
      </ul>
    </section>
  );
}
