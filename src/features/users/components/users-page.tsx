import { useCallback, useState } from 'react';
import { toast } from 'sonner';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { User } from '../../../../shared/schemas/user';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Dialog } from '../../../components/ui/dialog';
import { PageHeader } from '../../../components/ui/page-header';
import { Pagination } from '../../../components/ui/pagination';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { errorMessage } from '../../../lib/error-messages';
import { useUsers } from '../../../api/users/get-users';
import { useUpdateUser } from '../../../api/users/update-user';
import { CreateUserForm } from './create-user-form';
import { EditUserForm } from './edit-user-form';
import { ResetPasswordForm } from './reset-password-form';
import type { UserSiteChoice } from './user-options';
import { UsersTable, type UserAction } from './users-table';

const pageSize = 50;
type Open = { action: UserAction | 'create'; user?: User } | null;

interface UsersPageProps {
  currentUserId: number;
  defaultUnits: UnitSystem;
  canWrite: boolean;
  /** For a group of several sites: names for the Site column and the choice on the forms. */
  siteNames?: ReadonlyMap<number, string>;
  siteChoice?: UserSiteChoice;
}

export function UsersPage({ currentUserId, defaultUnits, canWrite, siteNames, siteChoice }: UsersPageProps) {
  const [page, setPage] = useState(1);
  const [open, setOpen] = useState<Open>(null);
  const users = useUsers({ page, pageSize });
  const updateUser = useUpdateUser();
  const close = () => setOpen(null);
  const onAction = useCallback((action: UserAction, user: User) => setOpen({ action, user }), []);
  const target = open?.user;

  const toggleDisabled = async () => {
    if (!target) return;
    try {
      await updateUser.mutateAsync({ id: target.id, changes: { disabled: !target.disabled } });
      toast.success(target.disabled ? `${target.name} can sign in again.` : `${target.name} can no longer sign in.`);
      close();
    } catch (error) {
      toast.error(errorMessage(error));
    }
  };

  return (
    <>
      <PageHeader
        title="Users"
        description="Who can sign in, and what their role lets them do. Disabled users keep their records but cannot sign in."
        actions={canWrite && <Button onClick={() => setOpen({ action: 'create' })}>Add user</Button>}
      />
      {users.isPending ? (
        <LoadingState what="users" />
      ) : users.isError ? (
        <ErrorState error={users.error} what="the users" onRetry={() => users.refetch()} />
      ) : users.data.items.length === 0 ? (
        <EmptyState title="No users found" />
      ) : (
        <>
          <UsersTable users={users.data.items} currentUserId={currentUserId} siteNames={siteNames} onAction={canWrite ? onAction : undefined} />
          <Pagination page={page} pageSize={pageSize} total={users.data.total} noun="users" onPage={setPage} />
        </>
      )}
      <Dialog open={open?.action === 'create'} onClose={close} title="Add a user">
        <CreateUserForm defaultUnits={defaultUnits} siteChoice={siteChoice} onDone={close} />
      </Dialog>
      <Dialog open={open?.action === 'edit'} onClose={close} title={`Edit ${target?.name ?? 'user'}`}>
        {target && <EditUserForm user={target} isSelf={target.id === currentUserId} siteChoice={siteChoice} onDone={close} />}
      </Dialog>
      <Dialog open={open?.action === 'password'} onClose={close} title={`Reset password for ${target?.name ?? 'user'}`}>
        {target && <ResetPasswordForm user={target} onDone={close} />}
      </Dialog>
      <ConfirmDialog
        open={open?.action === 'toggle-disabled'}
        title={target?.disabled ? `Enable ${target?.name}?` : `Disable ${target?.name ?? 'user'}?`}
        message={
          target?.disabled
            ? 'They will be able to sign in again with their current password.'
            : 'They will not be able to sign in until you enable them again. Their records stay.'
        }
        confirmLabel={target?.disabled ? 'Enable' : 'Disable'}
        variant={target?.disabled ? 'primary' : 'danger'}
        pending={updateUser.isPending}
        onConfirm={toggleDisabled}
        onCancel={close}
      />
    </>
  );
}
