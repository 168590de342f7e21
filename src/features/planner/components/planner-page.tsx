import { useState, type ReactNode } from 'react';
import { calendarDateIn } from '../../../../shared/time';
import { Button } from '../../../components/ui/button';
import { PageHeader } from '../../../components/ui/page-header';
import { EmptyState, ErrorState, LoadingState } from '../../../components/ui/states';
import { useBooths } from '../../../api/booths/get-booths';
import type { SpraySession } from '../../../../shared/schemas/spray-session';
import { useCancelSession } from '../hooks/use-cancel-session';
import { shopWallToInstant } from '../utils/shop-wall-clock';
import type { BookingTarget, PlanningSettings } from './booking-form';
import { AutoPlanDialog } from './auto-plan-dialog';
import { PlannerCalendar } from './planner-calendar';
import { PlannerDialogs, type Viewer } from './planner-dialogs';

interface PlannerPageProps {
  settings: PlanningSettings;
  viewer: Viewer;
  /** An admin looking at one site (left out: every site), and the switcher that chooses it. */
  siteId?: number;
  siteSwitcher?: ReactNode;
  /** The day to open on; today when not given. */
  initialDay?: string;
}

/** The booth planner: a week or day of spray sessions per booth, booked and moved by the lead. */
export function PlannerPage({ settings, viewer, siteId, siteSwitcher, initialDay }: PlannerPageProps) {
  const timeZone = settings.timezone;
  const [day, setDay] = useState(() => initialDay ?? calendarDateIn(new Date(), timeZone));
  const [booking, setBooking] = useState<BookingTarget | null>(null);
  const [opened, setOpened] = useState<SpraySession | undefined>(undefined);
  const [autoPlanning, setAutoPlanning] = useState(false);
  const booths = useBooths({ page: 1, pageSize: 200, siteId });
  const cancelSession = useCancelSession(timeZone);

  const bookBlank = () => {
    const start = shopWallToInstant(day, '08:00', timeZone).toISOString();
    const end = shopWallToInstant(day, '09:00', timeZone).toISOString();
    setBooking({ kind: 'new', start, end, boothId: null });
  };
  const booked = (saved: SpraySession | null) => {
    setBooking(null);
    // Show where the new booking landed, so the lead sees it on the calendar.
    if (saved) setDay(calendarDateIn(new Date(saved.start), timeZone));
  };

  const header = (
    <PageHeader
      title="Booth planner"
      description={
        viewer.canWrite
          ? 'Drag across free time to book a booth, drag a session to move it, or pull its lower edge to change its length.'
          : 'Who is in which booth, and when. The finishing lead books and moves sessions.'
      }
      actions={
        <>
          {siteSwitcher}
          {viewer.canWrite && booths.data && booths.data.items.length > 0 && (
            <div className="flex flex-wrap gap-2">
              <Button variant="secondary" onClick={() => setAutoPlanning(true)}>
                Auto-plan jobs
              </Button>
              <Button onClick={bookBlank}>Book a session</Button>
            </div>
          )}
        </>
      }
    />
  );
  if (booths.isPending || booths.isError || booths.data.items.length === 0) {
    return (
      <>
        {header}
        {booths.isPending ? (
          <LoadingState what="the booths" />
        ) : booths.isError ? (
          <ErrorState error={booths.error} what="the booths" onRetry={() => booths.refetch()} />
        ) : (
          <EmptyState title={siteId === undefined ? 'No booths yet' : 'No booths at this site yet'}>Booths are added under Booths; then sessions can be booked here.</EmptyState>
        )}
      </>
    );
  }
  return (
    <>
      {header}
      <PlannerCalendar
        settings={settings}
        booths={booths.data.items}
        siteId={siteId}
        canWrite={viewer.canWrite}
        day={day}
        onDay={setDay}
        onBook={(start, end, boothId) => setBooking({ kind: 'new', start, end, boothId })}
        onOpen={setOpened}
      />
      <AutoPlanDialog
        open={autoPlanning}
        onClose={() => setAutoPlanning(false)}
        timeZone={timeZone}
        boothNames={new Map(booths.data.items.map((b) => [b.id, b.name]))}
        siteId={siteId}
      />
      <PlannerDialogs
        viewer={viewer}
        settings={settings}
        booths={booths.data.items}
        booking={booking}
        opened={opened}
        onBooked={booked}
        onCloseSummary={() => setOpened(undefined)}
        onChangeBooking={(session) => {
          setOpened(undefined);
          setBooking({ kind: 'edit', session });
        }}
        onCancelSession={(session) => {
          setOpened(undefined);
          void cancelSession(session);
        }}
      />
    </>
  );
}
