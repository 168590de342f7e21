import { createContext, useContext, type ReactNode } from 'react';
import type { SignedInUser } from '../../shared/schemas/auth';

const SignedInUserContext = createContext<SignedInUser | null>(null);

export function SignedInUserProvider({ user, children }: { user: SignedInUser; children: ReactNode }) {
  return <SignedInUserContext value={user}>{children}</SignedInUserContext>;
}

/** The signed-in user; only for routes under RequireAuth, where there always is one. */
export function useSignedInUser(): SignedInUser {
  const user = useContext(SignedInUserContext);
  if (!user) throw new Error('useSignedInUser is used outside RequireAuth');
  return user;
}
