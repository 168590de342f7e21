import { describe, expect, it } from 'vitest';
import type { Reading } from '../../../../shared/schemas/reading';
import { currentReading } from '../../../../src/features/spray-session/utils/live-checklist';

const now = new Date('2026-12-05T07:20:00Z');
const reading = (minutesAgo: number) => ({ at: new Date(now.getTime() - minutesAgo * 60_000).toISOString(), airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19, source: 'sensor' }) as Reading;

describe('currentReading for the pre-spray checks', () => {
  it('offers a reading from the last half hour as the booth’s conditions', () => {
    expect(currentReading(reading(5), now)).toEqual(reading(5));
    expect(currentReading(reading(30), now)).toEqual(reading(30));
  });
  it('offers nothing from an older reading (a sensor gone quiet for days), nor without one', () => {
    expect(currentReading(reading(31), now)).toBeNull();
    expect(currentReading(reading(8 * 24 * 60), now)).toBeNull();
    expect(currentReading(null, now)).toBeNull();
  });
});
