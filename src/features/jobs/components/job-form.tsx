import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type DefaultValues } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createJobSchema, type Job } from '../../../../shared/schemas/job';
import { Button } from '../../../components/ui/button';
import { FieldShell, FormAlert, inputClasses, InputField, SelectField } from '../../../components/ui/field';
import { LoadingState } from '../../../components/ui/states';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateJob } from '../../../api/jobs/create-job';
import { useFinishSystems } from '../../../api/finish-systems/get-finish-systems';
import { useUpdateJob } from '../../../api/jobs/update-job';
import { jobStateOptions } from './job-format';

type JobFormInput = z.input<typeof createJobSchema>;
type JobFormOutput = z.output<typeof createJobSchema>;

const fieldNames = Object.keys(createJobSchema.shape);
const asIdOrNull = (value: unknown) => (value === '' || value === null || value === undefined ? null : Number(value));

function startingValues(job?: Job): DefaultValues<JobFormInput> {
  if (!job) return { customer: '', reference: '', dueDate: '', finishSystemId: null, colour: '', sheen: '', notes: '', state: 'open' };
  const { customer, reference, dueDate, finishSystemId, colour, sheen, notes, state } = job;
  return { customer, reference, dueDate, finishSystemId, colour, sheen, notes, state };
}

type Option = { value: string | number; label: string };
interface JobFormProps {
  job?: Job;
  onDone: (saved?: Job) => void;
}

/**
 * Creates a job, or edits the one given. Lead and owner only; the route decides who sees it.
 * Waits for the finish systems first: a select only shows its saved value if that option exists when the form starts.
 */
export function JobForm(props: JobFormProps) {
  const systems = useFinishSystems();
  if (systems.isPending) return <LoadingState what="the finish systems" />;
  const options: Option[] = [
    { value: '', label: 'None chosen yet' },
    ...(systems.data?.items ?? []).map((s) => ({ value: s.id, label: `${s.name} (${s.coatCount} ${s.coatCount === 1 ? 'coat' : 'coats'})` })),
  ];
  return <JobFormFields {...props} finishSystems={{ options, failed: systems.isError }} />;
}

function JobFormFields({ job, onDone, finishSystems }: JobFormProps & { finishSystems: { options: Option[]; failed: boolean } }) {
  const createJob = useCreateJob();
  const updateJob = useUpdateJob();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<JobFormInput, unknown, JobFormOutput>({ resolver: zodResolver(createJobSchema), defaultValues: startingValues(job) });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = job ? await updateJob.mutateAsync({ id: job.id, changes: values }) : await createJob.mutateAsync(values);
      toast.success(job ? `Job ${saved.reference} is updated.` : `Job ${saved.reference} is added.`);
      onDone(saved);
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <InputField label="Job reference" hint="Your own number, e.g. from the order book." error={errors.reference?.message} registration={register('reference')} />
        <InputField label="Customer" error={errors.customer?.message} registration={register('customer')} />
        <InputField type="date" label="Due date" hint="The day the parts must be finished." error={errors.dueDate?.message} registration={register('dueDate')} />
        <SelectField
          label="Finish system"
          options={finishSystems.options}
          hint={finishSystems.failed ? 'Could not load the finish systems; reload to try again.' : 'Needed for the material estimate and planning.'}
          error={errors.finishSystemId?.message}
          registration={register('finishSystemId', { setValueAs: asIdOrNull })}
        />
        <InputField label="Colour" hint="e.g. a colour card name or the customer’s sample." error={errors.colour?.message} registration={register('colour')} />
        <InputField label="Sheen" hint="e.g. Satin 30, Matt 10." error={errors.sheen?.message} registration={register('sheen')} />
        {job && (
          <SelectField
            label="State"
            options={jobStateOptions}
            hint="Boothwright moves the job on as coats land and parts are collected. A state you choose goes in the activity log; delivered and cancelled stay until a lead changes them."
            error={errors.state?.message}
            registration={register('state')}
          />
        )}
        <FieldShell label="Notes" error={errors.notes?.message} className="sm:col-span-2">
          {(control) => <textarea rows={3} className={inputClasses} {...control} {...register('notes')} />}
        </FieldShell>
      </div>
      <div className="mt-6 flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={() => onDone()}>
          Cancel
        </Button>
        <Button type="submit" pending={createJob.isPending || updateJob.isPending} pendingText="Saving…">
          {job ? 'Save changes' : 'Save job'}
        </Button>
      </div>
    </form>
  );
}
