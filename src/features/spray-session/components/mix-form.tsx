import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createMixSchema } from '../../../../shared/schemas/checklist';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import { thinningRangeWords } from '../../../../shared/words';
import { Button } from '../../../components/ui/button';
import { FormAlert, SelectField } from '../../../components/ui/field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateMix } from '../../../api/mixes/create-mix';
import { useSendOrKeep } from '../hooks/use-send-or-keep';
import { localMixId, newIdempotencyKey } from '../utils/idempotency';
import { LotChoice } from './lot-choice';
import { MixPreview } from './mix-preview';
import { StepperField } from './stepper-field';

type MixInput = z.input<typeof createMixSchema>;
type MixOutput = z.output<typeof createMixSchema>;
const fieldNames = Object.keys(createMixSchema.shape);

interface MixFormProps {
  sessionId: number;
  products: Product[];
  airTempC: number | null;
  units: UnitSystem;
  onDone: () => void;
}

export function MixForm({ sessionId, products, airTempC, units, onDone }: MixFormProps) {
  const createMix = useCreateMix();
  const sendOrKeep = useSendOrKeep(sessionId);
  const [formError, setFormError] = useState<string | null>(null);
  const first = products[0];
  const { control, register, handleSubmit, setError, setValue, formState } = useForm<MixInput, unknown, MixOutput>({
    resolver: zodResolver(createMixSchema),
    defaultValues: { productId: first?.id, lotIds: first?.lots.filter((l) => !l.expired).slice(0, 1).map((l) => l.id) ?? [], wantedL: 1, thinningPct: first?.thinnerMinPct ?? 0, tempC: airTempC ?? undefined },
  });
  const values = useWatch({ control });
  const product = products.find((p) => p.id === values.productId);
  const { errors } = formState;

  const onSubmit = handleSubmit(async (entry) => {
    setFormError(null);
    const input = { ...entry, mixedAt: new Date().toISOString(), idempotencyKey: newIdempotencyKey() };
    const label = `Mix: ${input.wantedL} L of ${product?.name ?? 'the product'}`;
    try {
      // The stand-in id lets a coat recorded offline name this pot before the server has given it one.
      const write = { kind: 'mix' as const, spraySessionId: sessionId, body: input, localId: localMixId(), label };
      const outcome = await sendOrKeep(write, () => createMix.mutateAsync({ spraySessionId: sessionId, input }));
      if (outcome.kind === 'saved') toast.success(`Mix recorded: ${outcome.value.totalL.toFixed(2)} L of ${outcome.value.productName}.`);
      else toast.warning('No connection: the mix is kept on this tablet and will be sent when the connection is back.');
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, setError, fieldNames));
    }
  });

  const productRegistration = register('productId', {
    setValueAs: Number,
    onChange: (event) => {
      const next = products.find((p) => p.id === Number(event.target.value));
      setValue('lotIds', []);
      setValue('thinningPct', next?.thinnerMinPct ?? 0);
    },
  });

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-4 rounded-panel border border-maple-300 bg-maple-50 p-4">
      <FormAlert message={formError} />
      <SelectField label="Product" options={products.map((p) => ({ value: p.id, label: p.name }))} error={errors.productId?.message} registration={productRegistration} />
      {product && <Controller control={control} name="lotIds" render={({ field }) => <LotChoice lots={product.lots} value={field.value ?? []} onChange={field.onChange} />} />}
      <div className="grid gap-4 md:grid-cols-3">
        <Controller control={control} name="wantedL" render={({ field }) => <StepperField label="Amount to mix" quantity="liquidVolume" units={units} step={units === 'us' ? 0.1 : 0.25} min={0} value={field.value} onChange={field.onChange} error={errors.wantedL?.message} />} />
        <Controller
          control={control}
          name="thinningPct"
          render={({ field }) => (
            <StepperField label="Thinner" unit="% of base + hardener" units={units} step={1} min={0} max={100} digits={0} value={field.value} onChange={(v) => field.onChange(v ?? 0)} hint={product ? `Data sheet: ${thinningRangeWords(product)}` : undefined} error={errors.thinningPct?.message} />
          )}
        />
        <Controller control={control} name="tempC" render={({ field }) => <StepperField label="Material temperature" quantity="temperature" units={units} step={units === 'us' ? 1 : 0.5} value={field.value} onChange={field.onChange} error={errors.tempC?.message} />} />
      </div>
      {product && <MixPreview product={product} wantedL={values.wantedL} thinningPct={values.thinningPct} tempC={values.tempC} units={units} />}
      <div className="flex flex-wrap justify-end gap-3">
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
        <Button type="submit" className="min-h-14 px-6 text-lg" pending={createMix.isPending} pendingText="Recording…">
          Record mix
        </Button>
      </div>
    </form>
  );
}
