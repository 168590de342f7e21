import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { updateUserSchema, type UpdateUserInput, type User } from '../../../../shared/schemas/user';
import { Button } from '../../../components/ui/button';
import { asNumber, FormAlert, InputField, SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useUpdateUser } from '../../../api/users/update-user';
import { roleOptions, unitOptions, type UserSiteChoice } from './user-options';

const fieldNames = ['name', 'role', 'units', 'siteId'];

interface EditUserFormProps {
  user: User;
  isSelf: boolean;
  siteChoice?: UserSiteChoice;
  onDone: () => void;
}

/** Name, role, units and (with several sites) site. Your own role is fixed here so the shop cannot lose its last owner by accident. */
export function EditUserForm({ user, isSelf, siteChoice, onDone }: EditUserFormProps) {
  const updateUser = useUpdateUser();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<UpdateUserInput>({
    resolver: zodResolver(updateUserSchema),
    defaultValues: { name: user.name, role: user.role, units: user.units, ...(siteChoice && { siteId: user.siteId }) },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const changes = isSelf ? { name: values.name, units: values.units, siteId: values.siteId } : values;
      const saved = await updateUser.mutateAsync({ id: user.id, changes });
      toast.success(`${saved.name} is updated.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormAlert message={formError} />
      <InputField label="Name" error={errors.name?.message} registration={register('name')} />
      <SelectField
        label="Role"
        options={roleOptions}
        disabled={isSelf}
        hint={isSelf ? 'You cannot change your own role.' : undefined}
        error={errors.role?.message}
        registration={register('role')}
      />
      <SelectField label="Units" options={unitOptions} error={errors.units?.message} registration={register('units')} />
      {siteChoice && (
        <SelectField label="Site" options={siteChoice.options} error={errors.siteId?.message} registration={register('siteId', { setValueAs: asNumber })} />
      )}
      <div className="flex flex-wrap justify-end gap-3 pt-2">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={updateUser.isPending} pendingText="Saving…">
          Save changes
        </Button>
      </div>
    </form>
  );
}
