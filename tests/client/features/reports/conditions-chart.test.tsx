// @vitest-environment jsdom
import { cleanup, render } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ConditionsChart } from '../../../../src/features/reports/components/charts/conditions-chart';

const hour = 3_600_000;
const points = [0, 1, 2, 3].map((i) => ({ t: i * hour, air: 18 + i, rh: 55, margin: 8 }));
const limits = { minTemp: 15, maxRh: 80, minMargin: 3 };
const chart = (outside: { t: number; air: number }[]) =>
  render(<ConditionsChart points={points} outside={outside} limits={limits} temperatureUnit="°C" timeWords={String} tickWords={String} />).container;

describe('the conditions chart', () => {
  beforeEach(() => {
    // Drawn at its printed size: jsdom lays nothing out, so a responsive chart would have no width.
    vi.stubGlobal('matchMedia', (query: string) => ({ matches: query === 'print', media: query, addEventListener: () => {}, removeEventListener: () => {} }));
  });
  afterEach(() => {
    cleanup();
    vi.unstubAllGlobals();
  });

  it('marks no reading as outside limits when no coat was', () => {
    const container = chart([]);
    expect(container.querySelector('.recharts-line')).not.toBeNull();
    expect(container.querySelectorAll('.recharts-scatter-symbol')).toHaveLength(0);
    expect(container.textContent).not.toContain('Coat outside limits');
  });

  it('marks only the coats made outside limits', () => {
    const container = chart([{ t: 2 * hour, air: 12 }]);
    expect(container.querySelectorAll('.recharts-scatter-symbol')).toHaveLength(1);
    expect(container.textContent).toContain('Coat outside limits');
  });
});
