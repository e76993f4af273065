import { Link } from 'react-router-dom';
import { sections } from '../../../config/sections';
import { isBuilt } from '../section-route';

/** Cards leading to the given sections, with what each is for. */
export function SectionLinks({ paths, label }: { paths: readonly string[]; label: string }) {
  const shown = paths.flatMap((path) => sections.filter((section) => section.path === path && isBuilt(path)));
  return (
    <nav aria-label={label}>
      <ul className="grid grid-cols-2 gap-3 lg:grid-cols-4">
        {shown.map((section) => (
          <li key={section.path}>
            <Link
              to={`/${section.path}`}
              className="card block h-full p-3 no-underline transition-colors hover:border-plum-300 sm:p-4"
            >
              <span className="block text-lg font-extrabold text-plum-800">{section.label}</span>
              <span className="text-sm text-muted">{section.summary}</span>
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
