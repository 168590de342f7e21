import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, useWatch, type Resolver } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createCrewRecordSchema, crewRecordKindLabels, crewRecordKinds, type CrewRecordKind } from '../../../../shared/schemas/crew';
import { Button } from '../../../components/ui/button';
import { FieldShell, FormAlert, InputField, SelectField, inputClasses } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useRecordCrew } from '../../../api/crew/record-crew';

/** Every field any kind may have; the shared schema keeps only those of the kind chosen. */
interface FlatInput {
  kind: CrewRecordKind;
  doneOn: string;
  nextDueOn: string | null;
  notes: string;
  respiratorModel?: string;
  result?: 'pass' | 'fail';
  title?: string;
}
type Output = z.output<typeof createCrewRecordSchema>;
const fieldNames = ['kind', 'doneOn', 'nextDueOn', 'notes', 'respiratorModel', 'result', 'title'];
const kindOptions = crewRecordKinds.map((kind) => ({ value: kind, label: crewRecordKindLabels[kind] }));
const resultOptions = [
  { value: 'pass', label: 'Pass' },
  { value: 'fail', label: 'Fail' },
];

interface CrewRecordFormProps {
  userId: number;
  name: string;
  today: string;
  intervals: { fitTestMonths: number; healthSurveillanceMonths: number };
  onDone: () => void;
}

function dueHint(kind: CrewRecordKind, intervals: CrewRecordFormProps['intervals']): string {
  if (kind === 'fit-test') return `Leave empty for ${intervals.fitTestMonths} months on (the shop’s interval).`;
  if (kind === 'health-surveillance') return `Leave empty for ${intervals.healthSurveillanceMonths} months on (the shop’s interval).`;
  return 'Leave empty if it need not be renewed.';
}

/** The owner records a fit test, health surveillance or training from its certificate or letter. */
export function CrewRecordForm({ userId, name, today, intervals, onDone }: CrewRecordFormProps) {
  const record = useRecordCrew();
  const [formError, setFormError] = useState<string | null>(null);
  const resolver = zodResolver(createCrewRecordSchema) as unknown as Resolver<FlatInput, unknown, Output>;
  const { register, handleSubmit, setError, control, formState: { errors } } = useForm<FlatInput, unknown, Output>({
    resolver,
    defaultValues: { kind: 'fit-test', doneOn: today, nextDueOn: null, notes: '', respiratorModel: '', result: 'pass', title: '' },
  });
  const kind = useWatch({ control, name: 'kind' });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await record.mutateAsync({ userId, record: values });
      toast.success(`${crewRecordKindLabels[values.kind]} recorded for ${name}.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate>
      <FormAlert message={formError} />
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="What" options={kindOptions} error={errors.kind?.message} registration={register('kind')} />
        <InputField type="date" label="Done on" max={today} error={errors.doneOn?.message} registration={register('doneOn')} />
        {kind === 'fit-test' && (
          <>
            <InputField label="Respirator tested" hint="Maker, model and size, as on the certificate." error={errors.respiratorModel?.message} registration={register('respiratorModel')} />
            <SelectField label="Result" options={resultOptions} error={errors.result?.message} registration={register('result')} />
          </>
        )}
        {kind === 'training' && <InputField label="Training" hint="What it was, e.g. “Diisocyanates: safe use”." error={errors.title?.message} registration={register('title')} />}
        <InputField type="date" label="Next due" hint={dueHint(kind, intervals)} error={errors.nextDueOn?.message} registration={register('nextDueOn', { setValueAs: (v: string) => (v ? v : null) })} />
      </div>
      <FieldShell label="Notes" error={errors.notes?.message} className="mt-4">
        {(controlProps) => <textarea rows={2} className={inputClasses} {...controlProps} {...register('notes')} />}
      </FieldShell>
      <div className="mt-6 flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" pending={record.isPending} pendingText="Saving…">
          Save record
        </Button>
      </div>
    </form>
  );
}
