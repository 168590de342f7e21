import type { DryingRow } from './drying-row-schema';
import { adjustDryingTimes } from './drying-times';
import type { RecoatWindow } from './readiness';

const minutes = (at: Date, min: number) => new Date(at.getTime() + min * 60_000);

/**
 * The recoat window a coat not yet sprayed will leave, taking the end of its booked session as
 * the time it goes on and the drying times at the temperature it is expected to dry at.
 */
export function projectedRecoatWindow(coatEndsAt: Date, dryingTimes: DryingRow[], tempC: number): RecoatWindow & { packAt: Date } {
  const { times } = adjustDryingTimes(dryingTimes, tempC);
  return {
    opensAt: minutes(coatEndsAt, times.recoatMinMin),
    closesAt: times.recoatMaxMin === null ? null : minutes(coatEndsAt, times.recoatMaxMin),
    packAt: minutes(coatEndsAt, times.packMin),
  };
}

/**
 * The window in which the next coat may go on every one of several parts sprayed together: it
 * opens when the last of them opens and closes when the first of them closes. Null when no
 * part has a window yet (nothing to wait for).
 */
export function sharedRecoatWindow(windows: RecoatWindow[]): RecoatWindow | null {
  if (windows.length === 0) return null;
  const opensAt = new Date(Math.max(...windows.map((w) => w.opensAt.getTime())));
  const closing = windows.flatMap((w) => (w.closesAt ? [w.closesAt.getTime()] : []));
  return { opensAt, closesAt: closing.length ? new Date(Math.min(...closing)) : null };
}
