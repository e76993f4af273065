import { useEffect } from 'react';
import { NavLink, useLocation } from 'react-router-dom';
import { BrandLink } from '@fryline/ui';
import { hasRole } from '@fryline/schemas';
import { roleNames, sections } from '../../config/sections';
import { useStaffMember } from '../session/staff-member';
import { SignOutButton } from '../session/sign-out-button';
import { WaitingToSend } from '../../features/counter/components/waiting-to-send';

const navLink = ({ isActive }: { isActive: boolean }) =>
  `block whitespace-nowrap rounded-full px-2.5 py-1.5 text-[0.95rem] font-extrabold no-underline sm:px-3 sm:text-base ${
    isActive ? 'bg-plum-800 text-paper' : 'text-ink hover:bg-crumb'
  }`;

export function StaffHeader() {
  const member = useStaffMember();
  const allowed = sections.filter((section) => hasRole(member.role, section.minRole));
  const { pathname } = useLocation();

  // On a narrow screen the navigation scrolls sideways: keep the current page's link in sight.
  useEffect(() => {
    document
      .querySelector('#staff-nav [aria-current="page"]')
      ?.scrollIntoView({ block: 'nearest', inline: 'nearest' });
  }, [pathname]);
  return (
    <header className="border-b border-line bg-paper">
      <div className="mx-auto flex max-w-6xl items-center gap-3 px-4 pt-3">
        <BrandLink className="text-xl">
          Fryline <span className="font-semibold text-muted">staff</span>
        </BrandLink>
        <div className="ml-auto flex items-center gap-3">
          <WaitingToSend />
          <span className="hidden text-right leading-tight sm:block">
            <span className="block font-semibold">{member.name}</span>
          </span>
          <span className="badge badge-plum" title={`Signed in as ${member.name}`}>
            {roleNames[member.role]}
          </span>
          <SignOutButton />
        </div>
      </div>
      <nav id="staff-nav" aria-label="Staff" className="mx-auto max-w-6xl overflow-x-auto px-4 py-2">
        <ul className="flex gap-1">
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
