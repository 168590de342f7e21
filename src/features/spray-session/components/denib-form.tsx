import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { z } from 'zod';
import { createDenibSchema } from '../../../../shared/schemas/denib';
import { Button } from '../../../components/ui/button';
import { FieldShell, FormAlert, inputClasses, SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useOnline } from '../../../lib/use-online';
import { useCreateDenib } from '../../../api/denibs/create-denib';
import { useSendOrKeep } from '../hooks/use-send-or-keep';
import { newIdempotencyKey } from '../utils/idempotency';
import type { PickedPart } from '../utils/picked-part';
import { PartChecklist } from './part-checklist';
import { denibWords, partsWords, upperFirst } from '../../../../shared/words';

// Denib between coats P240–P320, P400 on topcoats; a scuff after a missed window P320–P400 (trade reference §8).
const grits = ['P240', 'P280', 'P320', 'P360', 'P400', 'P600'];
const whenChoices = [
  { value: 0, label: 'Just now' },
  { value: 15, label: '15 minutes ago' },
  { value: 30, label: '30 minutes ago' },
  { value: 60, label: '1 hour ago' },
  { value: 120, label: '2 hours ago' },
];

const denibEntrySchema = createDenibSchema.pick({ partIds: true, grit: true, notes: true }).extend({ minutesAgo: z.coerce.number().int().min(0).max(24 * 60) });
const minutesBefore = (now: Date, minutes: number) => new Date(now.getTime() - minutes * 60_000).toISOString();

type DenibEntryInput = z.input<typeof denibEntrySchema>;
type DenibEntry = z.output<typeof denibEntrySchema>;

interface DenibFormProps {
  sessionId: number;
  parts: PickedPart[];
  /** Parts that need a denib now: ticked to start with. */
  needing: number[];
  grit: string;
  onDone: () => void;
}

/** Which parts were sanded, with what and when; the signed-in person is recorded as who. */
export function DenibForm({ sessionId, parts, needing, grit, onDone }: DenibFormProps) {
  const createDenib = useCreateDenib();
  const sendOrKeep = useSendOrKeep(sessionId);
  const online = useOnline();
  const [formError, setFormError] = useState<string | null>(null);
  const { control, register, handleSubmit, setError, formState } = useForm<DenibEntryInput, unknown, DenibEntry>({
    resolver: zodResolver(denibEntrySchema),
    defaultValues: { partIds: needing, grit, notes: '', minutesAgo: 0 },
  });

  const onSubmit = handleSubmit(async ({ minutesAgo, ...entry }) => {
    setFormError(null);
    const body = { ...entry, spraySessionId: sessionId, abradedAt: minutesBefore(new Date(), minutesAgo), idempotencyKey: newIdempotencyKey() };
    const label = `${upperFirst(denibWords(body.grit))} on ${partsWords(body.partIds.length)}`;
    try {
      const outcome = await sendOrKeep({ kind: 'denib', spraySessionId: sessionId, body, label }, () => createDenib.mutateAsync(body));
      if (outcome.kind === 'saved') {
        const { grit, partIds } = outcome.value;
        toast.success(`${upperFirst(denibWords(grit))} recorded on ${partsWords(partIds.length)}. The next coat can go on once its window opens.`);
      }
      else toast.warning('No connection: the denib is kept on this tablet and will be sent when the connection is back.');
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, ['partIds', 'grit', 'notes', 'abradedAt']));
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-4" aria-label="Denib">
      <FormAlert message={formError} />
      <Controller
        control={control}
        name="partIds"
        render={({ field }) => <PartChecklist parts={parts} chosen={(field.value ?? []).flatMap((id) => (id === undefined ? [] : [id]))} onChange={field.onChange} label="Parts sanded" />}
      />
      {formState.errors.partIds && <p className="font-medium text-verdict-stop">{formState.errors.partIds.message}</p>}
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Grit" options={grits.map((g) => ({ value: g, label: g }))} error={formState.errors.grit?.message} registration={register('grit')} />
        <SelectField label="When" options={whenChoices} error={formState.errors.minutesAgo?.message} registration={register('minutesAgo')} />
      </div>
      <FieldShell label="Notes" hint="e.g. faces only, or a run sanded out." error={formState.errors.notes?.message}>
        {(c) => <textarea {...c} rows={2} className={inputClasses} {...register('notes')} />}
      </FieldShell>
      {!online && <p className="font-medium text-verdict-caution">No connection: the denib is kept on this tablet and sent by itself when the connection is back.</p>}
      <div className="flex flex-wrap justify-end gap-3">
        <Button variant="secondary" className="min-h-14" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" className="min-h-14" pending={createDenib.isPending} pendingText="Recording…">
          Record denib
        </Button>
      </div>
    </form>
  );
}
