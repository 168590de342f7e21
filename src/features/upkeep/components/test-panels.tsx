import type { ReactNode } from 'react';
import type { BoothUpkeep } from '../../../../shared/schemas/upkeep';
import { Button } from '../../../components/ui/button';
import { StatusBadge } from '../../../components/ui/status-badge';
import { dayWords, dueLabel, dueTone, speed } from './upkeep-format';

function Panel({ title, badge, action, children }: { title: string; badge: ReactNode; action: ReactNode; children: ReactNode }) {
  return (
    <section aria-label={title} className="space-y-2 rounded-panel border border-maple-300 bg-white p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-lg font-semibold">{title}</h3>
        {badge}
      </div>
      {children}
      {action}
    </section>
  );
}

function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-wrap gap-x-2">
      <dt className="font-medium text-maple-700">{term}:</dt>
      <dd>{children}</dd>
    </div>
  );
}

export function ExtractionPanel({ upkeep, onRecord }: { upkeep: BoothUpkeep; onRecord?: () => void }) {
  const { latest, status, nextDueOn } = upkeep.extraction;
  return (
    <Panel
      title="Extraction test"
      badge={<StatusBadge tone={latest && !latest.meetsMinimum ? 'stop' : dueTone[status]}>{latest && !latest.meetsMinimum ? 'Below minimum' : dueLabel(status)}</StatusBadge>}
      action={onRecord && <Button onClick={onRecord}>Record extraction test</Button>}
    >
      {latest ? (
        <dl className="space-y-1">
          <Fact term="Tested">
            {dayWords(latest.testedOn)} by {latest.testedBy}
          </Fact>
          <Fact term="Mean face velocity">
            {speed(latest.meanFaceVelocityMps)} over {latest.faceVelocityPointsMps.length} points ({latest.meetsMinimum ? 'meets' : 'below'} the minimum of {speed(upkeep.booth.minFaceVelocityMps)})
          </Fact>
          <Fact term="Clearance time measured">{latest.clearanceMin === null ? 'not measured' : `${latest.clearanceMin} min`}</Fact>
          <Fact term="Next due">{dayWords(nextDueOn)}</Fact>
        </dl>
      ) : (
        <p className="text-maple-800">No extraction test is recorded for this booth yet. Record the last one from its certificate.</p>
      )}
    </Panel>
  );
}

export function FirePanel({ upkeep, onRecord }: { upkeep: BoothUpkeep; onRecord?: () => void }) {
  const { latest, status, nextDueOn } = upkeep.fire;
  const failed = latest !== null && !latest.passed;
  return (
    <Panel
      title="Fire-protection inspection"
      badge={<StatusBadge tone={failed ? 'stop' : dueTone[status]}>{failed ? 'Faults found' : dueLabel(status)}</StatusBadge>}
      action={onRecord && <Button onClick={onRecord}>Record inspection</Button>}
    >
      {latest ? (
        <dl className="space-y-1">
          <Fact term="Inspected">
            {dayWords(latest.inspectedOn)} by {latest.inspectedBy}
          </Fact>
          <Fact term="Result">{latest.passed ? 'Passed' : 'Faults found'}</Fact>
          {latest.notes && <Fact term="Notes">{latest.notes}</Fact>}
          <Fact term="Next due">{dayWords(nextDueOn)}</Fact>
        </dl>
      ) : (
        <p className="text-maple-800">No fire-protection inspection is recorded for this booth yet.</p>
      )}
    </Panel>
  );
}
