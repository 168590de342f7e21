import { createPlugin } from '@fullcalendar/core';
import { NamedTimeZoneImpl } from '@fullcalendar/core/internal';
import { offsetForWallClock, wallClockArray } from './shop-wall-clock';

/**
 * FullCalendar does true zone maths for a named `timeZone` only through a plugin; without one it
 * quietly shows UTC. This one answers from the browser's zone data, so the calendar shows the
 * shop's wall clock on any device and hands back real instants in its callbacks.
 */
class ShopTimeZone extends NamedTimeZoneImpl {
  offsetForArray(wall: number[]): number {
    return offsetForWallClock(wall, this.timeZoneName);
  }

  timestampToArray(ms: number): number[] {
    return wallClockArray(ms, this.timeZoneName);
  }
}

export const shopTimeZonePlugin = createPlugin({ name: 'boothwright-shop-time-zone', namedTimeZonedImpl: ShopTimeZone });
