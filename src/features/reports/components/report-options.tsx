import { FieldShell, inputClasses } from '../../../components/ui/field';
import type { ReportKind } from '../../../api/reports/report-keys';
import type { AreaGrouping, ReportAddress } from '../hooks/use-report-address';

export interface Choice {
  id: number;
  label: string;
}

interface ReportOptionsProps {
  kind: ReportKind;
  address: ReportAddress;
  /** The booth the conditions report shows: the one chosen, else the first booth. */
  conditionsBoothId?: number;
  booths: Choice[];
  jobs: Choice[];
  onChange: (patch: Partial<ReportAddress>) => void;
}

const toId = (value: string) => (value ? Number(value) : undefined);

/** The choices only some reports have: which booth, which job, how to group the area. */
export function ReportOptions({ kind, address, conditionsBoothId, booths, jobs, onChange }: ReportOptionsProps) {
  if (kind === 'booth-use' || kind === 'conditions') {
    const all = kind === 'booth-use';
    return (
      <FieldShell label="Booth" className="max-w-xs">
        {(control) => (
          <select {...control} className={inputClasses} value={(all ? address.boothId : conditionsBoothId) ?? ''} onChange={(e) => onChange({ boothId: toId(e.target.value) })}>
            {all && <option value="">All booths</option>}
            {!all && booths.length === 0 && <option value="">No booths set up</option>}
            {booths.map((booth) => (
              <option key={booth.id} value={booth.id}>
                {booth.label}
              </option>
            ))}
          </select>
        )}
      </FieldShell>
    );
  }
  if (kind === 'area-sprayed') {
    return (
      <FieldShell label="Group the area by" className="max-w-xs">
        {(control) => (
          <select {...control} className={inputClasses} value={address.groupBy} onChange={(e) => onChange({ groupBy: e.target.value as AreaGrouping })}>
            <option value="product-kind">Product kind</option>
            <option value="job">Job</option>
          </select>
        )}
      </FieldShell>
    );
  }
  if (kind === 'material') {
    return (
      <FieldShell label="Job" className="max-w-md">
        {(control) => (
          <select {...control} className={inputClasses} value={address.jobId ?? ''} onChange={(e) => onChange({ jobId: toId(e.target.value) })}>
            <option value="">All jobs</option>
            {jobs.map((job) => (
              <option key={job.id} value={job.id}>
                {job.label}
              </option>
            ))}
          </select>
        )}
      </FieldShell>
    );
  }
  return null;
}
