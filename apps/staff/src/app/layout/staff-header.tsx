import { NavLink } from 'react-router-dom';
import { BrandLink, useShop } from '@fryline/ui';
import { hasRole } from '@fryline/schemas';
import { roleNames, sections } from '../../config/sections';
import { useStaffMember } from '../session/staff-member';
import { SignOutButton } from '../session/sign-out-button';
import { isBuilt } from '../routes/section-route';
import { WaitingToSend } from '../../features/counter/components/waiting-to-send';

const navLink = ({ isActive }: { isActive: boolean }) =>
  `block whitespace-nowrap rounded-full px-2.5 py-1.5 text-[0.95rem] font-extrabold no-underline sm:px-3 sm:text-base ${
    isActive ? 'bg-plum-800 text-paper' : 'text-ink hover:bg-crumb'
  }`;

export function StaffHeader() {
  const member = useStaffMember();
  const shop = useShop();
  // the business's own name and logo, as its customers see them; Fryline until the settings have loaded
  const name = shop?.name ?? 'Fryline';
  // only pages that work, and only those this role may open
  const allowed = sections.filter((section) => hasRole(member.role, section.minRole) && isBuilt(section.path));
  return (
    <header className="border-b border-line bg-paper">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-3 gap-y-2 px-4 pt-3">
        <BrandLink className="text-xl" logo={shop?.logo ?? null} name={name}>
          <span className="min-w-0 truncate">{name}</span> <span className="shrink-0 font-semibold text-muted">staff</span>
        </BrandLink>
        <div className="ml-auto flex min-w-0 items-center gap-2 sm:gap-3">
          <WaitingToSend />
          <span className="max-w-[10rem] min-w-0 truncate text-right text-sm leading-tight font-semibold sm:max-w-[14rem] sm:text-base">
            {member.name}
          </span>
          <span className="badge badge-plum" title={`Signed in as ${member.name}`}>
            {roleNames[member.role]}
          </span>
          <SignOutButton />
        </div>
      </div>
      {/* the bar wraps onto a second line on a narrow screen: every page stays in sight */}
      <nav id="staff-nav" aria-label="Staff" className="mx-auto max-w-6xl px-4 py-2">
        <ul className="flex flex-wrap gap-1">
          <li>
            <NavLink to="/" end className={navLink}>
              Home
            </NavLink>
          </li>
          {allowed.map((section) => (
            <li key={section.path}>
              <NavLink to={`/${section.path}`} className={navLink}>
                {section.label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
    </header>
  );
}
