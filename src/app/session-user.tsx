import { createContext, useContext, type ReactNode } from 'react';
import type { SessionUser } from '../../shared/schemas/auth';

const SessionUserContext = createContext<SessionUser | null>(null);

export function SessionUserProvider({ user, children }: { user: SessionUser; children: ReactNode }) {
  return <SessionUserContext value={user}>{children}</SessionUserContext>;
}

/** The signed-in user; only for routes under RequireAuth, where there always is one. */
export function useSessionUser(): SessionUser {
  const user = useContext(SessionUserContext);
  if (!user) throw new Error('useSessionUser is used outside RequireAuth');
  return user;
}
