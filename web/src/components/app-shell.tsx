/** The frame round every page: skip link, navigation by role, theme switch, sign-out, and a bar while a page loads. */
import { useEffect, useRef } from 'react';
import { Link, NavLink, Outlet, useLocation, useNavigate, useNavigation } from 'react-router-dom';
import { useSession } from '../api/session.js';
import { useSignOut } from '../queries/auth.js';
import { focusMain, useRouteFocus } from '../lib/use-route-focus.js';
import { ThemeSwitch } from './theme-switch.js';

const navClass = ({ isActive }: { isActive: boolean }) =>
  `rounded px-2 py-1 ${isActive ? 'bg-slate-200 font-semibold dark:bg-slate-700' : 'hover:underline'}`;

export function AppShell() {
  const session = useSession();
  const navigation = useNavigation();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const role = session?.user.role;
  const location = useLocation();
  const main = useRef<HTMLElement>(null);
  useRouteFocus(main);
  const hadSession = useRef(session !== null);
  // A session the server stopped accepting (expired, revoked elsewhere) ends here: back to sign-in, then back to this page.
  useEffect(() => {
    if (hadSession.current && !session && location.pathname !== '/sign-in') {
      navigate(`/sign-in?next=${encodeURIComponent(location.pathname + location.search)}`, { replace: true });
    }
    hadSession.current = session !== null;
  }, [session, location.pathname, location.search, navigate]);
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        onClick={(e) => {
          // Moving focus (not only scrolling) makes the next Tab start inside the page.
          e.preventDefault();
          if (main.current) focusMain(main.current);
        }}
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-white focus:p-2 dark:focus:bg-slate-900"
      >
        Skip to content
      </a>
      <header className="no-print border-b border-slate-300 dark:border-slate-600">
        <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2">
          <Link to="/" className="font-mono text-lg font-semibold">
            fourfold
          </Link>
          {session && (
            <nav aria-label="Main" className="flex flex-wrap gap-1 text-sm">
              <NavLink to="/library" className={navClass}>
                Library
              </NavLink>
              {role === 'designer' && (
                <NavLink to="/upload" className={navClass}>
                  Upload
                </NavLink>
              )}
              <NavLink to="/account" className={navClass}>
                Account
              </NavLink>
              {role === 'admin' && (
                <NavLink to="/admin" className={navClass}>
                  Admin
                </NavLink>
              )}
            </nav>
          )}
          <div className="ml-auto flex items-center gap-2 text-sm">
            <ThemeSwitch />
            {session ? (
              <>
                <span className="muted hidden sm:inline">{session.user.name}</span>
                <button
                  type="button"
                  className="btn"
                  onClick={() => signOut.mutate(undefined, { onSettled: () => navigate('/sign-in') })}
                >
                  Sign out
                </button>
              </>
            ) : null}
          </div>
        </div>
        <div className="h-0.5" aria-hidden="true">
          {navigation.state === 'loading' && <div className="h-full w-full animate-pulse bg-teal-700" />}
        </div>
      </header>
      <main
        ref={main}
        id="main"
        tabIndex={-1}
        className="mx-auto w-full max-w-7xl flex-1 px-4 py-6 focus:outline-none"
        aria-busy={navigation.state === 'loading'}
      >
        <Outlet />
      </main>
    </div>
  );
}
