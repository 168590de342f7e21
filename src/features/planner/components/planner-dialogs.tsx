import type { Booth } from '../../../../shared/schemas/booth';
import { Dialog } from '../../../components/ui/dialog';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { BookingForm, type BookingTarget, type PlanningSettings } from './booking-form';
import { SessionSummary } from './session-summary';
import { spraySessionWords } from '../../../../shared/words';
import { useShopFormat } from '../../../api/settings/use-shop-format';

export interface Viewer {
  id: number;
  name: string;
  canWrite: boolean;
  canReadProducts: boolean;
  canReadUpkeep: boolean;
}

interface PlannerDialogsProps {
  viewer: Viewer;
  settings: PlanningSettings;
  booths: Booth[];
  booking: BookingTarget | null;
  opened: SpraySession | undefined;
  onBooked: (saved: SpraySession | null) => void;
  onCloseSummary: () => void;
  onChangeBooking: (session: SpraySession) => void;
  onCancelSession: (session: SpraySession) => void;
}

export function PlannerDialogs({ viewer, settings, booths, booking, opened, ...handlers }: PlannerDialogsProps) {
  const editing = booking?.kind === 'edit' ? booking.session : undefined;
  const shop = { ...useShopFormat(), timeZone: settings.timezone };
  const named = (session: SpraySession) => spraySessionWords({ boothName: session.boothName, startAt: new Date(session.start) }, shop);
  return (
    <>
      {viewer.canWrite && (
        <Dialog open={booking !== null} onClose={() => handlers.onBooked(null)} wide title={editing ? `Change the spray session: ${named(editing)}` : 'Book a spray session'}>
          {booking && <BookingForm target={booking} booths={booths} settings={settings} viewer={viewer} onDone={handlers.onBooked} />}
        </Dialog>
      )}
      <Dialog open={opened !== undefined} onClose={handlers.onCloseSummary} wide title={opened ? `Spray session: ${named(opened)}` : 'Spray session'}>
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
