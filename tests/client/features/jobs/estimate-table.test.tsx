// @vitest-environment jsdom
import { cleanup, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import type { Estimate } from '../../../../shared/schemas/job';
import { EstimateTable } from '../../../../src/features/jobs/components/estimate-table';

afterEach(cleanup);

const mix = { baseL: 1, hardenerL: 0, thinnerL: 0.1, totalL: 1.1 };
const step = (position: number, productName: string, cost: number | null) => ({ position, productId: position + 1, productName, dryFilmUm: 40, mixedL: 1, readyToSprayL: 1.1, mix, vocG: 100, cost });
const estimate = (currency: string): Estimate => ({
  areaM2: 4,
  transferEfficiencyPct: 65,
  method: 'hvlp',
  currency,
  // Position 1 is a denib step, which the estimate leaves out: the coats are still counted 1 and 2 of 2.
  steps: [step(0, 'Primer', 12.4), step(2, 'Topcoat', 1234.5)],
  totals: { mixedL: 2, readyToSprayL: 2.2, vocG: 200, cost: 1246.9, stepsWithoutVoc: 0, stepsWithoutPrice: 0 },
});

describe('the estimate table', () => {
  it('counts coats as coat n of m, not by step position', () => {
    render(<EstimateTable estimate={estimate('GBP')} units="metric" locale="en-GB" />);
    expect(screen.getByRole('rowheader', { name: 'Coat 1 of 2' })).toBeTruthy();
    expect(screen.getByRole('rowheader', { name: 'Coat 2 of 2' })).toBeTruthy();
    expect(screen.queryByText(/step 3/)).toBeNull();
  });

  it('writes costs in the estimate’s currency as the shop’s locale does', () => {
    render(<EstimateTable estimate={estimate('GBP')} units="metric" locale="en-GB" />);
    expect(within(screen.getByRole('row', { name: /Coat 1 of 2/ })).getByText('£12.40')).toBeTruthy();
    expect(within(screen.getByRole('row', { name: /All steps/ })).getByText('£1,246.90')).toBeTruthy();
  });

  it('writes euros the German way for a shop in Germany', () => {
    render(<EstimateTable estimate={estimate('EUR')} units="metric" locale="de-DE" />);
    // Intl.NumberFormat de-DE currency: decimal comma, group dot, the sign after a no-break space.
    expect(screen.getByRole('row', { name: /All steps/ }).textContent).toContain('1.246,90\u00a0€');
  });
});
