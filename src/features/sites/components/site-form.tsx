import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { createSiteSchema, type CreateSiteInput, type Site } from '../../../../shared/schemas/site';
import { Button } from '../../../components/ui/button';
import { FormAlert, InputField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateSite } from '../../../api/sites/create-site';
import { useUpdateSite } from '../../../api/sites/update-site';

const fieldNames = Object.keys(createSiteSchema.shape);

/** Adds a site, or renames the one given. */
export function SiteForm({ site, onDone }: { site?: Site; onDone: () => void }) {
  const createSite = useCreateSite();
  const updateSite = useUpdateSite();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<CreateSiteInput>({ resolver: zodResolver(createSiteSchema), defaultValues: { name: site?.name ?? '' } });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = site ? await updateSite.mutateAsync({ id: site.id, changes: values }) : await createSite.mutateAsync(values);
      toast.success(site ? `The site is now called “${saved.name}”.` : `Site “${saved.name}” is added.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <FormAlert message={formError} />
      <InputField label="Name" autoComplete="off" hint="As people in the group call it, e.g. the town or the street." error={errors.name?.message} registration={register('name')} />
      <div className="flex flex-wrap justify-end gap-3 pt-2">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={createSite.isPending || updateSite.isPending} pendingText="Saving…">
          {site ? 'Save name' : 'Save site'}
        </Button>
      </div>
    </form>
  );
}
