import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import type { Coat } from '../../../../shared/schemas/coat';
import { addCoatPhotoFieldsSchema, photoSubjectLabels, photoSubjects } from '../../../../shared/schemas/coat-photo';
import { Button } from '../../../components/ui/button';
import { FieldShell, FormAlert, InputField, SelectField, inputClasses } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useAddCoatPhoto } from '../../../api/coat-photos/add-coat-photo';

type Input = z.input<typeof addCoatPhotoFieldsSchema>;
type Output = z.output<typeof addCoatPhotoFieldsSchema>;
const subjectOptions = photoSubjects.map((subject) => ({ value: subject, label: photoSubjectLabels[subject] }));
const maxBytes = 10 * 1024 * 1024;

/** A photo from the tablet's camera (or a file) for one coat: what it shows and a few words. The coat record itself never changes. */
export function AddPhotoForm({ coat, onDone }: { coat: Coat; onDone: () => void }) {
  const add = useAddCoatPhoto();
  const [file, setFile] = useState<File | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  // The chosen file shown before it is sent; its object URL is released when the file changes or the form closes.
  const preview = useMemo(() => (file ? URL.createObjectURL(file) : null), [file]);
  const { register, handleSubmit, setError, formState: { errors } } = useForm<Input, unknown, Output>({ resolver: zodResolver(addCoatPhotoFieldsSchema), defaultValues: { subject: 'defect', caption: '' } });

  useEffect(() => () => {
    if (preview) URL.revokeObjectURL(preview);
  }, [preview]);

  const choose = (chosen: File | undefined) => {
    setFileError(chosen && chosen.size > maxBytes ? 'The photo is larger than 10 MB; take it again at a smaller size.' : null);
    setFile(chosen ?? null);
  };

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    if (!file) return setFileError('Take or choose a photo.');
    if (fileError) return;
    try {
      await add.mutateAsync({ coatId: coat.id, file, ...values });
      toast.success(`Photo added to coat ${coat.id}.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['subject', 'caption']));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <FieldShell label="Photo" hint="On a tablet this opens the camera. JPEG, PNG or WebP up to 10 MB." error={fileError ?? undefined}>
        {(control) => <input type="file" accept="image/*" capture="environment" className={`${inputClasses} file:mr-3 file:min-h-touch`} {...control} onChange={(event) => choose(event.target.files?.[0])} />}
      </FieldShell>
      {preview && <img src={preview} alt="The photo chosen" className="mt-3 max-h-56 rounded-panel border border-maple-300 object-contain" />}
      <div className="mt-4 grid gap-4 sm:grid-cols-2">
        <SelectField label="It shows" options={subjectOptions} error={errors.subject?.message} registration={register('subject')} />
        <InputField label="Caption" hint="Where and what, in a few words." error={errors.caption?.message} registration={register('caption')} />
      </div>
      <div className="mt-6 flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={add.isPending} pendingText="Uploading…">
          Add photo
        </Button>
      </div>
    </form>
  );
}
