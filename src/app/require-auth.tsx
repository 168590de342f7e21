import { Navigate, Outlet, useLocation } from 'react-router-dom';
import { useMe } from '../api/auth/get-me';
import { FullPageStatus } from './full-page-status';
import { SignedInUserProvider } from './signed-in-user';

/** Routes inside need a signed-in user; otherwise off to sign in, remembering where they were going. */
export function RequireAuth() {
  const me = useMe();
  const location = useLocation();

  if (me.data === undefined) {
    if (me.isError) throw me.error;
    return <FullPageStatus>Checking your sign-in…</FullPageStatus>;
  }
  if (me.data === null) {
    const next = `${location.pathname}${location.search}${location.hash}`;
    const search = next === '/' ? '' : `?next=${encodeURIComponent(next)}`;
    return <Navigate to={`/sign-in${search}`} replace />;
  }
  return (
    <SignedInUserProvider user={me.data}>
      <Outlet />
    </SignedInUserProvider>
  );
}
