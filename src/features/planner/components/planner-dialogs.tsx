import type { Booth } from '../../../../shared/schemas/booth';
import type { User } from '../../../../shared/schemas/user';
import { Dialog } from '../../../components/ui/dialog';
import type { PlannerSession } from '../api/get-spray-sessions';
import { BookingForm, type BookingTarget, type PlanningSettings } from './booking-form';
import { SessionSummary } from './session-summary';

export interface Viewer {
  id: number;
  name: string;
  canWrite: boolean;
  canReadProducts: boolean;
  canReadUpkeep: boolean;
}

/**
 * Who a session can be given to. The full user list is the owner's alone; a lead may leave it
 * open or take it themself, and a session already given to someone keeps that choice on offer.
 */
function sprayerOptions(viewer: Viewer, sprayers: User[] | undefined, current: PlannerSession | undefined) {
  const options: { value: number | ''; label: string }[] = [{ value: '', label: 'Not assigned yet' }];
  if (sprayers) options.push(...sprayers.map((s) => ({ value: s.id, label: s.id === viewer.id ? `${s.name} (me)` : s.name })));
  else options.push({ value: viewer.id, label: `Me (${viewer.name})` });
  if (current?.sprayerId && !options.some((o) => o.value === current.sprayerId)) {
    options.push({ value: current.sprayerId, label: current.sprayerName ?? 'The sprayer booked now' });
  }
  return options;
}

interface PlannerDialogsProps {
  viewer: Viewer;
  settings: PlanningSettings;
  booths: Booth[];
  sprayers: User[] | undefined;
  booking: BookingTarget | null;
  opened: PlannerSession | undefined;
  onBooked: (saved: PlannerSession | null) => void;
  onCloseSummary: () => void;
  onChangeBooking: (session: PlannerSession) => void;
  onCancelSession: (session: PlannerSession) => void;
}

export function PlannerDialogs({ viewer, settings, booths, sprayers, booking, opened, ...handlers }: PlannerDialogsProps) {
  const editing = booking?.kind === 'edit' ? booking.session : undefined;
  return (
    <>
      {viewer.canWrite && (
        <Dialog open={booking !== null} onClose={() => handlers.onBooked(null)} wide title={editing ? `Change spray session ${editing.id}` : 'Book a spray session'}>
          {booking && <BookingForm target={booking} booths={booths} settings={settings} sprayerOptions={sprayerOptions(viewer, sprayers, editing)} onDone={handlers.onBooked} />}
        </Dialog>
      )}
      <Dialog open={opened !== undefined} onClose={handlers.onCloseSummary} wide title={opened ? `Spray session ${opened.id}` : 'Spray session'}>
        {opened && (
          <SessionSummary
            shown={opened}
            booth={booths.find((booth) => booth.id === opened.boothId)}
            timeZone={settings.timezone}
            canWrite={viewer.canWrite}
            canReadProducts={viewer.canReadProducts}
            canReadUpkeep={viewer.canReadUpkeep}
            onChange={() => handlers.onChangeBooking(opened)}
            onCancel={() => handlers.onCancelSession(opened)}
          />
        )}
      </Dialog>
    </>
  );
}
