import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { createUserSchema } from '../../../../shared/schemas/user';
import { Button } from '../../../components/ui/button';
import { asNumber, FormAlert, InputField, SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateUser } from '../../../api/users/create-user';
import { roleOptions, unitOptions, type UserSiteChoice } from './user-options';

type CreateUserFormInput = z.input<typeof createUserSchema>;
const fieldNames = Object.keys(createUserSchema.shape);

interface CreateUserFormProps {
  defaultUnits: UnitSystem;
  siteChoice?: UserSiteChoice;
  onDone: () => void;
}

export function CreateUserForm({ defaultUnits, siteChoice, onDone }: CreateUserFormProps) {
  const createUser = useCreateUser();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<CreateUserFormInput, unknown, z.output<typeof createUserSchema>>({
    resolver: zodResolver(createUserSchema),
    defaultValues: { email: '', name: '', role: 'sprayer', units: defaultUnits, password: '', ...(siteChoice && { siteId: siteChoice.defaultSiteId }) },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const user = await createUser.mutateAsync(values);
      toast.success(`${user.name} can now sign in.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormAlert message={formError} />
      <InputField label="Name" autoComplete="off" error={errors.name?.message} registration={register('name')} />
      <InputField label="E-mail" type="email" autoComplete="off" error={errors.email?.message} registration={register('email')} />
      <SelectField label="Role" options={roleOptions} error={errors.role?.message} registration={register('role')} />
      {siteChoice && (
        <SelectField label="Site" options={siteChoice.options} error={errors.siteId?.message} registration={register('siteId', { setValueAs: asNumber })} />
      )}
      <SelectField label="Units" options={unitOptions} error={errors.units?.message} registration={register('units')} />
      <InputField
        label="First password"
        type="text"
        autoComplete="new-password"
        spellCheck={false}
        hint="At least 10 characters, not a common or easily guessed one. Give it to them in person; they can keep it or you can reset it later."
        error={errors.password?.message}
        registration={register('password')}
      />
      <div className="flex flex-wrap justify-end gap-3 pt-2">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={createUser.isPending} pendingText="Saving…">
          Save user
        </Button>
      </div>
    </form>
  );
}
