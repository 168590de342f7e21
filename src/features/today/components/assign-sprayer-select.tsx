import { useId } from 'react';
import { toast } from 'sonner';
import type { Sprayer } from '../../../../shared/schemas/sprayer';
import type { TodaySession } from '../../../../shared/schemas/today';
import { inputClasses } from '../../../components/ui/field';
import { errorMessage } from '../../../lib/error-messages';
import { useUpdateSpraySession } from '../../../api/spray-sessions/update-spray-session';
import { spraySessionWords } from '../../../../shared/words';
import { useShopFormat } from '../../../api/settings/use-shop-format';

interface AssignSprayerSelectProps {
  session: TodaySession;
  /** The active sprayers and leads of the session's booth's site. */
  sprayers: Sprayer[];
  label: string;
}

/** Give a planned session to someone (or change who has it) without leaving the board. */
export function AssignSprayerSelect({ session, sprayers, label }: AssignSprayerSelectProps) {
  const id = useId();
  const assign = useUpdateSpraySession();
  const named = spraySessionWords({ boothName: session.boothName, startAt: new Date(session.start) }, useShopFormat());
  const change = (value: string) => {
    const sprayerId = value === '' ? null : Number(value);
    const name = sprayers.find((s) => s.id === sprayerId)?.name;
    assign.mutate(
      { id: session.id, changes: { sprayerId } },
      {
        onSuccess: () => toast.success(name ? `${name} sprays ${named}.` : `No sprayer now for ${named}.`),
        onError: (error) => toast.error(`Not changed: ${errorMessage(error)}`),
      },
    );
  };
  return (
    <div className="flex flex-wrap items-center gap-2">
      <label htmlFor={id} className="text-sm font-medium">
        Sprayer<span className="sr-only"> for {label}</span>
      </label>
      <select id={id} className={`${inputClasses} max-w-60`} value={session.sprayerId ?? ''} disabled={assign.isPending} onChange={(event) => change(event.target.value)}>
        <option value="">Not assigned yet</option>
        {sprayers.map((s) => (
          <option key={s.id} value={s.id}>
            {s.name}
          </option>
        ))}
      </select>
      {assign.isPending && <span role="status" className="text-sm text-maple-700">Saving…</span>}
    </div>
  );
}
