import { NavLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { cn } from '@/lib/cn';

const tabs = [
  { to: paths.admin.catalog.path, label: 'Parts' },
  { to: paths.admin.catalogAssemblies.path, label: 'Assemblies and lines' },
  { to: paths.admin.catalogQuality.path, label: 'Data quality' },
];

/** The three pages of the catalog editor. */
export function CatalogAdminNav() {
  return (
    <nav aria-label="Catalog editor" className="mb-6 flex flex-wrap gap-1 border-b border-rule">
      {tabs.map((t) => (
        <NavLink
          key={t.to}
          to={t.to}
          end
          className={({ isActive }) =>
            cn('-mb-px rounded-t-tag border-b-2 px-3 py-2 text-sm font-semibold', isActive ? 'border-patina-600 text-ink' : 'border-transparent text-ink-muted hover:text-ink')
          }
        >
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}
