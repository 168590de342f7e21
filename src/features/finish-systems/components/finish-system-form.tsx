import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm, useWatch, type DefaultValues } from 'react-hook-form';
import { toast } from 'sonner';
import type { z } from 'zod';
import { createFinishSystemSchema, type FinishSystem } from '../../../../shared/schemas/finish-system';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import { Button } from '../../../components/ui/button';
import { FormAlert, InputField } from '../../../components/ui/field';
import { TemperatureField } from '../../../components/ui/temperature-field';
import { applyServerErrors } from '../../../lib/form-errors';
import { useCreateFinishSystem } from '../../../api/finish-systems/create-finish-system';
import { useUpdateFinishSystem } from '../../../api/finish-systems/update-finish-system';
import type { FinishSystemFormInput } from './step-row';
import { StepsEditor } from './steps-editor';
import { SystemTotals } from './system-totals';

type FinishSystemFormOutput = z.output<typeof createFinishSystemSchema>;

interface FinishSystemFormProps {
  system?: FinishSystem;
  products: Product[];
  units: UnitSystem;
  startTempC: number;
  onDone: () => void;
}

const fieldNames = ['name', 'description', 'steps'];

function startingValues(system?: FinishSystem): DefaultValues<FinishSystemFormInput> {
  if (!system) return { name: '', description: '', steps: [] };
  const steps = system.steps.map((s) => (s.kind === 'coat' ? { kind: s.kind, productId: s.productId, dryFilmUm: s.dryFilmUm } : { kind: s.kind, grit: s.grit }));
  return { name: system.name, description: system.description, steps };
}

function LiveTotals({ products, units, startTempC }: { products: Product[]; units: UnitSystem; startTempC: number }) {
  const steps = useWatch<FinishSystemFormInput, 'steps'>({ name: 'steps' }) ?? [];
  const [tempC, setTempC] = useState(startTempC);
  const byId = new Map(products.map((p) => [p.id, p]));
  return (
    <section aria-labelledby="live-totals" className="rounded-panel border border-lacquer-200 bg-lacquer-50 p-3">
      <h3 id="live-totals" className="mb-2 font-semibold">
        Totals for these steps
      </h3>
      <TemperatureField label="Drying temperature" valueC={tempC} onChange={setTempC} units={units} className="mb-3 max-w-48" />
      <SystemTotals steps={steps} products={byId} tempC={tempC} units={units} />
    </section>
  );
}

export function FinishSystemForm({ system, products, units, startTempC, onDone }: FinishSystemFormProps) {
  const create = useCreateFinishSystem();
  const update = useUpdateFinishSystem();
  const [formError, setFormError] = useState<string | null>(null);
  const form = useForm<FinishSystemFormInput, unknown, FinishSystemFormOutput>({ resolver: zodResolver(createFinishSystemSchema), defaultValues: startingValues(system) });
  const { register, formState } = form;

  const onSubmit = form.handleSubmit(async (values) => {
    setFormError(null);
    try {
      const saved = system ? await update.mutateAsync({ id: system.id, changes: values }) : await create.mutateAsync(values);
      toast.success(system ? `Finish system “${saved.name}” is saved.` : `Finish system “${saved.name}” is added.`);
      onDone();
    } catch (error) {
      setFormError(applyServerErrors(error, form.setError, fieldNames));
    }
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate className="space-y-4">
        <FormAlert message={formError} />
        <InputField label="Name" error={formState.errors.name?.message} registration={register('name')} />
        <InputField label="Description" hint="Optional: colour, sheen, where it is used." error={formState.errors.description?.message} registration={register('description')} />
        <StepsEditor products={products} />
        <LiveTotals products={products} units={units} startTempC={startTempC} />
        <div className="flex flex-wrap justify-end gap-3">
          <Button variant="secondary" onClick={onDone}>
            Cancel
          </Button>
          <Button type="submit" pending={create.isPending || update.isPending} pendingText="Saving…">
            {system ? 'Save changes' : 'Save finish system'}
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
