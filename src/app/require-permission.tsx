import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { can, roleLabels, type Permission } from '../../shared/permissions';
import { buttonClasses } from '../components/ui/button';
import { useSignedInUser } from './signed-in-user';

/** For pages reached by typing the address: the nav already hides them from roles without the permission. */
export function RequirePermission({ permission, children }: { permission: Permission; children: ReactNode }) {
  const user = useSignedInUser();
  if (can(user.role, permission)) return children;
  return (
    <div className="max-w-xl rounded-panel border-2 border-verdict-caution bg-white p-6">
      <h1 className="text-2xl font-bold">Not part of your role</h1>
      <p className="mt-2">
        This page is not open to a {roleLabels[user.role].toLowerCase()}. If you need it, ask the owner to change your role.
      </p>
      <Link to="/" className={buttonClasses('secondary', 'mt-4')}>
        Back to Today
      </Link>
    </div>
  );
}
