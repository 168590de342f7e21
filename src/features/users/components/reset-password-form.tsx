import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { updateUserSchema, type User } from '../../../../shared/schemas/user';
import { Button } from '../../../components/ui/button';
import { FormAlert, InputField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useUpdateUser } from '../../../api/users/update-user';

const resetPasswordSchema = updateUserSchema.pick({ password: true }).required();
type ResetPasswordInput = { password: string };

export function ResetPasswordForm({ user, onDone }: { user: User; onDone: () => void }) {
  const updateUser = useUpdateUser();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<ResetPasswordInput>({ resolver: zodResolver(resetPasswordSchema), defaultValues: { password: '' } });

  const onSubmit = handleSubmit(async ({ password }) => {
    setFormError(null);
    try {
      await updateUser.mutateAsync({ id: user.id, changes: { password } });
      toast.success(`${user.name}'s password is changed.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['password']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormAlert message={formError} />
      <InputField
        label="New password"
        type="text"
        autoComplete="new-password"
        spellCheck={false}
        hint="At least 10 characters, not a common or easily guessed one. Tell them in person."
        error={errors.password?.message}
        registration={register('password')}
      />
      <div className="flex flex-wrap justify-end gap-3 pt-2">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={updateUser.isPending} pendingText="Saving…">
          Set password
        </Button>
      </div>
    </form>
  );
}
