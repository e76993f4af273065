import { Link, NavLink } from 'react-router-dom';
import { AccountMenu } from '../../features/auth/components/account-menu';
import { site } from '../../config/site';

const navLink = ({ isActive }: { isActive: boolean }) =>
  `rounded-full px-3 py-1.5 font-extrabold no-underline ${isActive ? 'bg-plum-100 text-plum-800' : 'text-ink hover:bg-crumb'}`;

export function SiteHeader() {
  return (
    <header className="border-b border-line bg-paper">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3">
        <Link to="/" className="flex items-center gap-2 text-2xl font-extrabold text-plum-800 no-underline">
          <span className="brand-mark" aria-hidden="true" />
          {site.name}
        </Link>
        <nav aria-label="Main" className="order-last w-full sm:order-none sm:w-auto">
          <ul className="flex gap-1">
            <li>
              <NavLink to="/" end className={navLink}>
                Bake days
              </NavLink>
            </li>
            <li>
              <NavLink to="/orders" className={navLink}>
                My orders
              </NavLink>
            </li>
          </ul>
        </nav>
        <div className="ml-auto">
          <AccountMenu />
        </div>
      </div>
    </header>
  );
}
