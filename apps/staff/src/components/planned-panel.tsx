import type { PlannedPage } from '../config/planned-pages';

/** A placeholder that says plainly what is coming, instead of an empty page. */
export function PlannedPanel({ plan }: { plan: PlannedPage }) {
  return (
    <div className="card border-dashed">
      <p className="badge badge-plum">Not built yet</p>
      <p className="mt-3 font-extrabold">This page arrives with {plan.arrivesWith}. It will show:</p>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        {plan.will.map((line) => (
          <li key={line}>{line}</li>
        ))}
      </ul>
    </div>
  );
}
