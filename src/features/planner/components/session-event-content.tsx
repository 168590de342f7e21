import type { EventContentArg } from '@fullcalendar/core';
import { spraySessionStateLabels } from '../../../../shared/schemas/spray-session';
import type { BoothIdentity } from '../../../lib/booth-identity';
import { coatHeadline, coatMaterial, partsWords } from '../../../lib/session-work-words';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { sprayerWords, stateChipColours } from '../utils/session-events';

/** The recoat-window shading shown while a session is dragged; named once, where each stretch begins. */
function WindowLabel({ arg }: { arg: EventContentArg }) {
  if (!arg.isStart) return null;
  return <p className="px-1 pt-0.5 text-[0.7rem] leading-tight font-semibold">{arg.event.title}</p>;
}

/** Free time being chosen: only the span, so the lead sees what they are booking. */
function NewSelection({ arg }: { arg: EventContentArg }) {
  return (
    <div className="h-full px-1 text-xs leading-snug">
      <p className="tabular-nums font-semibold">{arg.timeText}</p>
      <p>New session</p>
    </div>
  );
}

/**
 * What each block says, most important first so a short block still says it: time and state,
 * job and coat, product and colour, parts, sprayer, then booth. Text wraps rather than being
 * cut, so blocks side by side stay readable.
 */
function SessionBlock({ arg, session, identity }: { arg: EventContentArg; session: SpraySession; identity: BoothIdentity | undefined }) {
  const cancelled = session.state === 'cancelled';
  const struck = cancelled ? 'line-through' : '';
  const chip = stateChipColours[session.state];
  const coat = session.work.coats[0];
  const moreCoats = session.work.coats.length - 1;
  return (
    <div className="flex h-full overflow-hidden text-xs leading-snug" title={arg.event.title}>
      <span aria-hidden="true" className="w-1.5 shrink-0" style={identity?.band} />
      <div className="min-w-0 flex-1 overflow-hidden px-1 py-0.5 break-words">
        <p className={`tabular-nums ${struck}`}>
          <span className="font-semibold">{arg.timeText}</span>{' '}
          <span className={`rounded px-1 font-semibold whitespace-nowrap ${cancelled ? 'uppercase border border-maple-500' : ''}`} style={{ backgroundColor: chip.background, color: chip.text }}>
            {spraySessionStateLabels[session.state]}
          </span>
        </p>
        {coat && <p className={`font-semibold ${struck}`}>{coatHeadline(coat)}{moreCoats > 0 ? ` +${moreCoats}` : ''}</p>}
        {coat && <p className={struck}>{coatMaterial(coat)}</p>}
        <p className={struck}>{partsWords(session.work)}</p>
        <p className={`${struck} ${session.sprayerName ? '' : 'font-semibold italic'}`}>{sprayerWords(session)}</p>
        <p className={`font-semibold ${struck}`} style={{ color: identity?.ink }}>
          {session.boothName}
        </p>
      </div>
    </div>
  );
}

export function SessionEventContent({ arg }: { arg: EventContentArg }) {
  const { session, identity, recoat } = arg.event.extendedProps as { session?: SpraySession; identity?: BoothIdentity; recoat?: boolean };
  if (recoat) return <WindowLabel arg={arg} />;
  if (!session) return <NewSelection arg={arg} />;
  return <SessionBlock arg={arg} session={session} identity={identity} />;
}
