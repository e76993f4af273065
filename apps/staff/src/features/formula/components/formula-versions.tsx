import { formatDateTime } from '@fryline/ui/format';
import type { FormulaList } from '@fryline/schemas';

const browserZone = () => Intl.DateTimeFormat().resolvedOptions().timeZone;

/** Every saved version, newest first; an older one can be loaded into the editor to start from. */
export function FormulaVersions({
  list,
  onLoad,
}: {
  list: FormulaList;
  onLoad: (formula: FormulaList['current']['formula'], version: number) => void;
}) {
  const zone = browserZone();
  return (
    <section aria-labelledby="versions-heading" className="card flex flex-col gap-3">
      <h2 id="versions-heading" className="text-xl">
        Versions
      </h2>
      {list.versions.length === 0 ? (
        <p className="text-muted">Nothing saved yet: the editor starts from the built-in formula.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-left">
            <caption className="sr-only">Saved formula versions, newest first</caption>
            <thead className="text-sm text-muted">
              <tr className="border-b border-line">
                <th scope="col" className="py-2 pr-3">
                  Version
                </th>
                <th scope="col" className="py-2 pr-3">
                  Note
                </th>
                <th scope="col" className="py-2 pr-3">
                  Saved
                </th>
                <td />
              </tr>
            </thead>
            <tbody>
              {list.versions.map((version) => (
                <tr key={version.id} className="border-b border-line last:border-b-0">
                  <th scope="row" className="py-2 pr-3 whitespace-nowrap">
                    {version.version}
                    {version.version === list.current.version && <span className="badge badge-ok ml-2">newest</span>}
                  </th>
                  <td className="py-2 pr-3">{version.note || <span className="text-muted">no note</span>}</td>
                  <td className="py-2 pr-3 whitespace-nowrap">{formatDateTime(version.createdAt, zone)}</td>
                  <td className="py-2 text-right">
                    <button
                      type="button"
                      className="btn btn-quiet btn-small whitespace-nowrap"
                      onClick={() => onLoad(version.formula, version.version)}
                    >
                      Start from version {version.version}
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </section>
  );
}
