import { NavLink } from 'react-router-dom';
import { BrandLink, useShop } from '@fryline/ui';
import { AccountMenu } from '../../features/auth/components/account-menu';

const navLink = ({ isActive }: { isActive: boolean }) =>
  `rounded-full px-3 py-1.5 font-extrabold no-underline ${isActive ? 'bg-plum-100 text-plum-800' : 'text-ink hover:bg-crumb'}`;

export function SiteHeader() {
  const shop = useShop();
  return (
    <header className="border-b border-line bg-paper">
      <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-3">
        <BrandLink className="min-h-10 text-2xl" logo={shop?.logo ?? null} name={shop?.name ?? null} />
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
