import type { Capacity } from '@fryline/production';
import { limitNames } from '../model/settings-fields';

/** What the saved equipment can make in a bake day, and which piece of kit sets the limit. */
export function CapacityPanel({ capacity }: { capacity: Capacity }) {
  return (
    <section aria-labelledby="capacity-heading" className="card flex flex-col gap-3">
      <h2 id="capacity-heading" className="text-xl">
        What the equipment allows
      </h2>
      <p>
        About <span className="font-extrabold">{capacity.pieces} rings</span> a bake day, limited by{' '}
        <span className="font-extrabold">{limitNames[capacity.limitedBy].toLowerCase()}</span>. Each ring’s centre is a
        hole, so holes come along with the rings.
      </p>
      <table className="w-full max-w-md text-left">
        <caption className="sr-only">Rings each piece of kit allows</caption>
        <thead className="text-sm text-muted">
          <tr className="border-b border-line">
            <th scope="col" className="py-1.5 pr-3">
              Limit
            </th>
            <th scope="col" className="py-1.5 text-right">
              Rings
            </th>
          </tr>
        </thead>
        <tbody>
          {capacity.candidates.map((candidate) => (
            <tr key={candidate.limit} className="border-b border-line last:border-b-0">
              <th scope="row" className="py-1.5 pr-3 font-semibold">
                {limitNames[candidate.limit]}
                {candidate.limit === capacity.limitedBy && <span className="badge badge-warn ml-2">sets the limit</span>}
              </th>
              <td className="py-1.5 text-right tabular-nums">{candidate.pieces}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
