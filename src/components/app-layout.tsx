import { NavLink, Outlet, Link } from 'react-router-dom';
import { Wordmark } from './wordmark';
import { AccountMenu } from './account-menu';
import { Toaster } from './ui/toast';
import { useMe } from '../features/auth/api/session';
import { roleAtLeast, type Role } from '../../shared/schemas/auth';

const nav: { to: string; label: string; least: Role }[] = [
  { to: '/search', label: 'Search', least: 'viewer' },
  { to: '/records', label: 'Records', least: 'viewer' },
  { to: '/contribute', label: 'Contribute', least: 'member' },
  { to: '/scout', label: 'Scout', least: 'viewer' },
  { to: '/tools', label: 'Column & eluent', least: 'viewer' },
  { to: '/classes', label: 'Classes', least: 'viewer' },
  { to: '/bookmarks', label: 'Bookmarks', least: 'viewer' },
  { to: '/curation', label: 'Curation', least: 'curator' },
  { to: '/imports', label: 'Import', least: 'curator' },
  { to: '/admin/users', label: 'People', least: 'admin' },
];

export function AppLayout() {
  const { data } = useMe();
  const user = data?.user;
  const links = user ? nav.filter((n) => roleAtLeast(user.role, n.least)) : [];
  return (
    <div className="min-h-screen flex flex-col">
      <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:p-2 focus:bg-surface">
        Skip to content
      </a>
      <header className="border-b border-line bg-surface">
        <div className="mx-auto max-w-7xl px-4 py-2 flex flex-wrap items-center gap-x-6 gap-y-2">
          <Link to="/" className="shrink-0">
            <Wordmark />
          </Link>
          <nav aria-label="Main" className="flex flex-wrap gap-1 text-sm">
            {links.map((n) => (
              <NavLink
                key={n.to}
                to={n.to}
                className={({ isActive }) =>
                  `px-2 py-1 rounded-plate ` +
                  `${isActive ? 'bg-front-light text-front-dark font-medium' : 'text-ink-soft hover:text-ink hover:bg-plate'}`
                }
              >
                {n.label}
              </NavLink>
            ))}
          </nav>
          <div className="ml-auto">
            <AccountMenu />
          </div>
        </div>
      </header>
      <main id="main" className="flex-1 mx-auto w-full max-w-7xl px-4 py-6">
        <Outlet />
      </main>
      <footer className="border-t border-line text-xs text-ink-soft">
        <div className="mx-auto max-w-7xl px-4 py-3 flex flex-wrap gap-4">
          <span className="py-1">Rfolio — the group's purification memory.</span>
          <Link to="/cautions" className="inline-block min-h-6 py-0.5 text-front underline">
            Lab cautions
          </Link>
        </div>
      </footer>
      <Toaster />
    </div>
  );
}
