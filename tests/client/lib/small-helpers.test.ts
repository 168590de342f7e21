import { describe, expect, it } from 'vitest';
import { ApiError } from '../../../src/lib/api-client';
import { errorMessage } from '../../../src/lib/error-messages';
import { safeNextPath } from '../../../src/lib/safe-next-path';
import { formatQuantity } from '../../../src/lib/units-display';
import { summariseOpeningHours } from '../../../src/features/booths/components/booth-format';
import { navFor } from '../../../src/app/nav-items';

describe('safeNextPath', () => {
  it('keeps a path inside the app', () => expect(safeNextPath('/booths?page=2')).toBe('/booths?page=2'));
  it('sends anything off-site home', () => {
    for (const next of ['https://example.test', '//example.test', '/\\example.test', '', null, 'booths']) expect(safeNextPath(next)).toBe('/');
  });
  it('does not loop back to sign-in', () => expect(safeNextPath('/sign-in?next=/')).toBe('/'));
});

describe('errorMessage', () => {
  it('uses the server’s words where they are specific', () => {
    expect(errorMessage(new ApiError(401, 'unauthenticated', 'E-mail or password is wrong'))).toBe('E-mail or password is wrong');
  });
  it('uses our own words for failures the server cannot explain to people', () => {
    expect(errorMessage(new ApiError(500, 'internal', 'TypeError at line 3'))).toMatch(/went wrong on our side/);
  });
  it('has words for anything that is not an ApiError', () => expect(errorMessage(new Error('x'))).toMatch(/went wrong/));
});

describe('summariseOpeningHours', () => {
  it('joins consecutive days with the same hours', () => {
    const week = [1, 2, 3, 4, 5].map((weekday) => ({ weekday, opens: '07:00', closes: '17:00' }));
    expect(summariseOpeningHours([...week, { weekday: 6, opens: '08:00', closes: '12:00' }])).toBe('Mon–Fri 07:00–17:00; Sat 08:00–12:00');
  });
  it('says when a booth is never open', () => expect(summariseOpeningHours([])).toBe('Closed every day'));
});

describe('formatQuantity', () => {
  it('shows metric as stored', () => expect(formatQuantity('roomVolume', 72, 'metric')).toBe('72.0 m³'));
  it('converts for US users (1 m³/h = 0.5886 cfm)', () => expect(formatQuantity('airflow', 21600, 'us')).toBe('12,713 cfm'));
  it('converts a spray rate as an area per hour', () => expect(formatQuantity('areaRate', 10, 'us')).toBe('107.6 ft²/h'));
});

describe('navFor', () => {
  const labels = (role: Parameters<typeof navFor>[0]) => navFor(role).flatMap((group) => group.items.map((item) => item.label));
  it('gives the admin the users page', () => expect(labels('admin')).toContain('Users'));
  it('keeps the calculator from the assembler', () => expect(labels('assembler')).not.toContain('Calculator'));
  it('gives the sprayer the calculator but not the activity log', () => {
    expect(labels('sprayer')).toContain('Calculator');
    expect(labels('sprayer')).not.toContain('Activity log');
  });
});
