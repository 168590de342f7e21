import { useEffect, useRef } from 'react';
import { Link, Outlet, useLocation, useNavigate, useNavigation } from 'react-router-dom';
import { toast } from 'sonner';
import { roleLabels } from '../../shared/permissions';
import { useLogout } from '../api/auth/logout';
import { errorMessage } from '../lib/error-messages';
import { WriteQueueSender } from '../features/spray-session/components/write-queue-sender';
import { MainNav } from './main-nav';
import { useSignedInUser } from './signed-in-user';
import { useNavMenu } from './use-nav-menu';
import { Wordmark } from './wordmark';

function UserBlock({ onSignOut, pending, tone }: { onSignOut: () => void; pending: boolean; tone: 'dark' | 'light' }) {
  const user = useSignedInUser();
  const dark = tone === 'dark';
  return (
    <div className="flex items-center gap-3">
      <p className="text-right leading-tight">
        <span className="block font-semibold">{user.name}</span>
        <span className={`block text-sm ${dark ? 'text-lacquer-100' : 'text-maple-700'}`}>{roleLabels[user.role]}</span>
      </p>
      <button
        type="button"
        onClick={onSignOut}
        disabled={pending}
        className={`min-h-touch rounded-panel border px-4 font-semibold ${dark ? 'border-lacquer-300 hover:bg-lacquer-700 focus-visible:outline-maple-100' : 'border-maple-400 bg-white hover:bg-maple-100'}`}
      >
        {pending ? 'Signing out…' : 'Sign out'}
      </button>
    </div>
  );
}

export function AppLayout() {
  const { open: menuOpen, toggle: toggleMenu, close: closeMenu, buttonRef: menuButtonRef, navRef } = useNavMenu();
  const user = useSignedInUser();
  const logout = useLogout();
  const navigate = useNavigate();
  const navigation = useNavigation();
  const { pathname } = useLocation();
  const mainRef = useRef<HTMLElement>(null);
  const lastPath = useRef(pathname);

  // After moving to another page, put focus at the start of the new content for keyboard and screen-reader users.
  useEffect(() => {
    if (lastPath.current === pathname) return;
    lastPath.current = pathname;
    mainRef.current?.focus();
  }, [pathname]);

  const signOut = async () => {
    try {
      await logout.mutateAsync();
    } catch (error) {
      toast.error(errorMessage(error));
    }
    navigate('/sign-in', { replace: true });
  };

  return (
    <div className="min-h-dvh">
      <WriteQueueSender />
      <a href="#main" className="sr-only z-50 print:hidden rounded-panel bg-white px-4 py-3 font-semibold text-lacquer-900 focus:not-sr-only focus:fixed focus:top-2 focus:left-2">
        Skip to main content
      </a>
      <header className="sticky top-0 z-30 bg-lacquer-800 text-white shadow print:hidden">
        <div className="flex min-h-16 items-center justify-between gap-3 px-4 lg:px-6">
          <Link to="/" className="rounded-panel py-1 focus-visible:outline-maple-100">
            <Wordmark />
          </Link>
          <div className="hidden sidebar:block">
            <UserBlock onSignOut={signOut} pending={logout.isPending} tone="dark" />
          </div>
          <button
            ref={menuButtonRef}
            type="button"
            className="min-h-touch min-w-touch rounded-panel border border-lacquer-300 px-4 font-semibold hover:bg-lacquer-700 focus-visible:outline-maple-100 sidebar:hidden"
            aria-expanded={menuOpen}
            aria-controls="main-nav"
            onClick={toggleMenu}
          >
            {menuOpen ? 'Close menu' : 'Menu'}
          </button>
        </div>
        {navigation.state !== 'idle' && (
          <div role="status" className="h-1 w-full animate-pulse bg-lacquer-300">
            <span className="sr-only">Loading page…</span>
          </div>
        )}
      </header>
      <div className="sidebar:flex sidebar:min-h-[calc(100dvh-4rem)] print:block">
        <div className="sidebar:w-60 sidebar:shrink-0 sidebar:border-r sidebar:border-maple-300 sidebar:bg-maple-100 print:hidden">
          <nav
            ref={navRef}
            id="main-nav"
            aria-label="Main"
            className={`${menuOpen ? 'block' : 'hidden'} border-b border-maple-300 bg-maple-100 px-3 py-4 sidebar:sticky sidebar:top-16 sidebar:block sidebar:max-h-[calc(100dvh-4rem)] sidebar:overflow-y-auto sidebar:border-b-0`}
          >
            <MainNav role={user.role} onNavigate={closeMenu} />
            <div className="mt-6 border-t border-maple-300 pt-4 sidebar:hidden">
              <UserBlock onSignOut={signOut} pending={logout.isPending} tone="light" />
            </div>
          </nav>
        </div>
        <main id="main" ref={mainRef} tabIndex={-1} className="min-w-0 flex-1 px-4 py-6 focus:outline-none sm:px-6 sidebar:px-8 print:p-0">
          <Outlet />
        </main>
      </div>
    </div>
  );
}
