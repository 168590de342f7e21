import { useState } from 'react';
import type { ReadyPart } from '../../../../shared/schemas/ready';
import { missedWindowScuffGrit } from '../../../../shared/finishing/readiness';
import { Button } from '../../../components/ui/button';
import type { SessionPlan } from '../hooks/use-session-plan';
import { fromPart, type PickedPart } from '../utils/picked-part';
import { DenibForm } from './denib-form';
import { denibNeededWords } from '../../../../shared/words';

const gritOf = (part: ReadyPart | undefined) => part?.nextStepGrit ?? missedWindowScuffGrit;

function progress(part: ReadyPart | undefined): string | undefined {
  if (!part) return undefined;
  return part.abradeRequired ? denibNeededWords(gritOf(part)) : `${part.coatsDone} of ${part.coatsTotal} coats done`;
}

/** Denib or scuff between coats, recorded like a coat: it clears "denib needed" and lets a missed window's coat go on. */
export function DenibSection({ sessionId, plan, canRecord }: { sessionId: number; plan: SessionPlan; canRecord: boolean }) {
  const [open, setOpen] = useState(false);
  const parts: PickedPart[] = plan.parts.map((part) => ({ ...fromPart(part), progress: progress(plan.ready.get(part.id)) }));
  const needing = plan.parts.filter((part) => plan.ready.get(part.id)?.abradeRequired).map((part) => part.id);
  if (!canRecord) return null;
  return (
    <section aria-labelledby="denib-heading" className="space-y-3 rounded-panel border-2 border-dashed border-maple-500 bg-white p-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <div>
          <h2 id="denib-heading" className="text-xl font-bold">
            Denib between coats
          </h2>
          <p className="text-maple-800">
            {needing.length > 0 ? `${needing.length === 1 ? '1 planned part needs' : `${needing.length} planned parts need`} a denib before the next coat.` : 'No planned part needs a denib right now.'}
          </p>
        </div>
        {!open && (
          <Button variant={needing.length > 0 ? 'primary' : 'secondary'} className="min-h-14" onClick={() => setOpen(true)} disabled={parts.length === 0}>
            Record a denib
          </Button>
        )}
      </div>
      {open && <DenibForm sessionId={sessionId} parts={parts} needing={needing} grit={gritOf(plan.ready.get(needing[0]))} onDone={() => setOpen(false)} />}
    </section>
  );
}
