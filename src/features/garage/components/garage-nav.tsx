import { Link, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';
import { useUnreadNoticeCount } from '../api/get-notices';

/** The garage's own tabs: vehicles, wanted alerts and notices (with the unread count). */
export function GarageNav() {
  const { pathname } = useLocation();
  const unread = useUnreadNoticeCount();
  const count = unread.data ?? 0;
  const items = [
    // '/garage' is a prefix of the other tabs, so each tab says itself when it is the current one.
    { to: paths.garage.getHref(), label: 'Vehicles', active: pathname === paths.garage.getHref() || pathname.startsWith('/garage/vehicles') },
    { to: paths.garageAlerts.getHref(), label: 'Wanted alerts', active: pathname === paths.garageAlerts.getHref() },
    { to: paths.garageNotices.getHref(), label: 'Notices', active: pathname === paths.garageNotices.getHref(), count },
  ];
  return (
    <nav aria-label="Garage" className="-mt-4 mb-6 print:hidden">
      <ul className="flex flex-wrap gap-1 border-b border-rule">
        {items.map((item) => (
          <li key={item.to}>
            <Link
              to={item.to}
              aria-current={item.active ? 'page' : undefined}
              className={cn(
                '-mb-px inline-flex h-9 items-center gap-2 border-b-2 px-3 text-sm font-medium',
                item.active ? 'border-patina-600 text-ink' : 'border-transparent text-ink-soft hover:text-ink',
              )}
            >
              {item.label}
              {item.count ? (
                <span className="rounded-full bg-patina-600 px-1.5 text-xs font-semibold text-white">
                  {item.count}
                  <span className="sr-only"> unread</span>
                </span>
              ) : null}
            </Link>
          </li>
        ))}
      </ul>
    </nav>
  );
}
