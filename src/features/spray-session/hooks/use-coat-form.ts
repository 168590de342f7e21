import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { z } from 'zod';
import type { Mix } from '../../../../shared/schemas/checklist';
import { createCoatSchema } from '../../../../shared/schemas/coat';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import type { Reading } from '../../../../shared/schemas/reading';
import { coatStepsOf, suggestedStep } from '../utils/session-plan';
import type { PickedPart } from '../utils/picked-part';
import { useFinishWork } from './use-finish-work';
import type { SessionPlan } from './use-session-plan';

const coatEntrySchema = createCoatSchema
  .pick({ partIds: true, airTempC: true, relativeHumidityPct: true, surfaceTempC: true, thinningPct: true, wetFilmUm: true, stepPosition: true, lotId: true, mixId: true, notes: true, reworkReason: true })
  // A pot kept on the tablet has a stand-in id below zero until the server gives it one (the queue swaps it before sending).
  .extend({ mixId: z.number().int().nullable() })
  .refine((coat) => coat.stepPosition !== null, { path: ['stepPosition'], message: 'Choose the step this coat is' });
export type CoatEntryInput = z.input<typeof coatEntrySchema>;
/** The form's fields, where the server's field errors are shown. */
export const coatEntryFields = Object.keys(coatEntrySchema.shape);
type CoatEntry = z.output<typeof coatEntrySchema>;

/** Thinner as a share of base + hardener, which is how the mix recorded it. */
const thinningOfMix = (mix: Mix) => Math.round((mix.thinnerL / (mix.baseL + mix.hardenerL)) * 1000) / 10;

function startingConditions(session: SpraySession, reading: Reading | null) {
  const checks = session.checklist;
  if (checks) return { airTempC: checks.airTempC, relativeHumidityPct: checks.relativeHumidityPct, surfaceTempC: checks.surfaceTempC };
  return { airTempC: reading?.airTempC, relativeHumidityPct: reading?.relativeHumidityPct, surfaceTempC: reading?.surfaceTempC ?? undefined };
}

/** The coat form's state and what follows from it: the parts' finish system, the step, its product, mixes and lots. */
/** `due` are the planned parts whose next coat is this session's step: the form starts with them chosen. */
export function useCoatForm(session: SpraySession, plan: SessionPlan, planned: PickedPart[], due: number[], mixes: Mix[], reading: Reading | null) {
  const [known, setKnown] = useState(() => new Map(planned.map((part) => [part.id, part])));
  const form = useForm<CoatEntryInput, unknown, CoatEntry>({
    resolver: zodResolver(coatEntrySchema),
    defaultValues: { partIds: due, stepPosition: null, wetFilmUm: null, thinningPct: 0, lotId: null, mixId: null, notes: '', reworkReason: null, ...startingConditions(session, reading) },
  });
  const values = useWatch({ control: form.control });
  const chosen = (values.partIds ?? []).flatMap((id) => (id === undefined ? [] : (known.get(id) ?? [])));
  const work = useFinishWork(chosen.map((part) => part.jobId));
  const first = chosen[0];
  const system = first ? work.systemByJob.get(first.jobId) : undefined;
  const steps = coatStepsOf(system);
  const step = steps.find((s) => s.position === values.stepPosition);
  const product = step ? work.products.get(step.productId) : undefined;
  const productMixes = mixes.filter((mix) => mix.productId === product?.id);
  const systems = new Set(chosen.map((part) => work.systemByJob.get(part.jobId)?.id ?? null));
  const suggested = first ? suggestedStep(plan.steps.get(first.id), system, work.ready.get(first.id)) : null;

  const { setValue } = form;
  useEffect(() => {
    if (values.stepPosition === null && suggested !== null) setValue('stepPosition', suggested);
  }, [values.stepPosition, suggested, setValue]);

  // A new product (or a new pot of it) brings its own mix, lot and thinning as the starting point.
  const newestMix = productMixes[0];
  useEffect(() => {
    if (!product) return;
    setValue('mixId', newestMix?.id ?? null);
    setValue('thinningPct', newestMix ? thinningOfMix(newestMix) : product.thinnerMinPct);
    setValue('lotId', newestMix?.lotIds[0] ?? product.lots.find((lot) => !lot.expired)?.id ?? null);
  }, [product, newestMix, setValue]);

  const choose = (ids: number[], parts: PickedPart[]) => {
    if (parts.length) setKnown((current) => new Map([...current, ...parts.map((part) => [part.id, part] as const)]));
    const firstJob = (parts.find((p) => p.id === ids[0]) ?? known.get(ids[0]))?.jobId;
    // Parts of another job may follow another finish system: the step is worked out again for them.
    if (firstJob !== first?.jobId) setValue('stepPosition', null);
    setValue('partIds', ids, { shouldValidate: form.formState.isSubmitted });
  };

  /** After a coat is recorded: the parts still due (not those just coated), and the step worked out again for them. */
  const startNext = (recorded: number[]) => {
    setValue('stepPosition', null);
    setValue('partIds', due.filter((id) => !recorded.includes(id)));
  };

  return { form, values, known, chosen, choose, startNext, work, steps, step, product, productMixes, mixedSystems: systems.size > 1 };
}
