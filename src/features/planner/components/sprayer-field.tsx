import type { UseFormRegisterReturn } from 'react-hook-form';
import type { Sprayer } from '../../../../shared/schemas/sprayer';
import { SelectField } from '../../../components/ui/field';
import { useSprayers } from '../../../api/sprayers/get-sprayers';
import type { SpraySession } from '../../../../shared/schemas/spray-session';

export interface SprayerViewer {
  id: number;
  name: string;
}

/**
 * Who a session can be given to: nobody yet, or an active sprayer or lead of the booth's site.
 * A session already given to someone keeps that choice on offer while the list loads.
 */
function sprayerOptions(viewer: SprayerViewer, sprayers: Sprayer[] | undefined, current: Pick<SpraySession, 'sprayerId' | 'sprayerName'> | undefined) {
  const options: { value: number | ''; label: string }[] = [{ value: '', label: 'Not assigned yet' }];
  for (const s of sprayers ?? []) options.push({ value: s.id, label: s.id === viewer.id ? `${s.name} (me)` : `${s.name}${s.role === 'lead' ? ' (lead)' : ''}` });
  if (current?.sprayerId && !options.some((o) => o.value === current.sprayerId)) {
    options.push({ value: current.sprayerId, label: current.sprayerName ?? 'The sprayer booked now' });
  }
  return options;
}

interface SprayerFieldProps {
  boothId: number | undefined;
  viewer: SprayerViewer;
  current: Pick<SpraySession, 'sprayerId' | 'sprayerName'> | undefined;
  registration: UseFormRegisterReturn;
  error: string | undefined;
  className?: string;
}

export function SprayerField({ boothId, viewer, current, registration, error, className }: SprayerFieldProps) {
  const sprayers = useSprayers(boothId);
  const hint = sprayers.isError ? 'The list of sprayers could not be loaded; the session can be given to someone later.' : sprayers.isPending ? 'Loading who works at this booth’s site…' : 'Active sprayers and leads of this booth’s site.';
  return <SelectField label="Sprayer" className={className} hint={hint} options={sprayerOptions(viewer, sprayers.data, current)} error={error} registration={registration} />;
}
