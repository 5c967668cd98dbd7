import { NavLink } from 'react-router-dom';
import type { Role, User } from '@shared/schemas/auth';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';

type NavItem = { label: string; to: string; visible: (roles: readonly Role[] | null) => boolean };

const everyone = () => true;
const has = (role: Role) => (roles: readonly Role[] | null) => roles !== null && roles.includes(role);

// Order as shown. `roles` is null when nobody is signed in.
export const navItems: NavItem[] = [
  { label: 'Catalog', to: paths.catalog.path, visible: everyone },
  { label: 'Search', to: paths.search.path, visible: everyone },
  { label: 'Garage', to: paths.garage.path, visible: has('buyer') },
  { label: 'Cart', to: paths.cart.path, visible: has('buyer') },
  { label: 'Orders', to: paths.orders.path, visible: has('buyer') },
  { label: 'Seller desk', to: paths.seller.path, visible: has('seller') },
  { label: 'Admin', to: paths.admin.root.path, visible: has('admin') },
];

export function SiteNav({ user }: { user: User | null }) {
  const roles = user ? user.roles : null;
  return (
    <nav aria-label="Main">
      <ul className="-mx-2 flex flex-wrap items-center gap-x-1 gap-y-1">
        {navItems
          .filter((item) => item.visible(roles))
          .map((item) => (
            <li key={item.to}>
              <NavLink
                to={item.to}
                className={({ isActive }) =>
                  cn(
                    'inline-flex h-9 items-center rounded-tag px-2.5 text-sm font-medium',
                    isActive ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunk hover:text-ink',
                  )
                }
              >
                {item.label}
              </NavLink>
            </li>
          ))}
      </ul>
    </nav>
  );
}
