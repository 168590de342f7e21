// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { ConditionsSection } from '../../../../src/features/calculator/components/conditions-section';
import { ChecklistVerdict } from '../../../../src/features/spray-session/components/checklist-verdict';

afterEach(cleanup);

const dewPointLine = () => screen.getByText(/The surface is .* above the dew point/).closest('li')!;

describe('information close to a limit is not a warning', () => {
  it('the calculator shows a surface a little over the 3 °C margin as a note beside a go', () => {
    render(<ConditionsSection units="metric" />);
    // 20 °C air at 55 % RH has a dew point of about 10.7 °C (Magnus formula); a 14.5 °C surface is 3.8 °C above it.
    fireEvent.change(screen.getByLabelText(/Surface temperature of the part/), { target: { value: '14.5' } });
    expect(within(dewPointLine()).getByText('Note')).toBeTruthy();
    expect(within(dewPointLine()).queryByText('Go')).toBeNull();
    expect(screen.getByText('Go: fit to spray')).toBeTruthy();
  });

  it('the calculator shows a surface well clear of the dew point as a plain go', () => {
    render(<ConditionsSection units="metric" />);
    fireEvent.change(screen.getByLabelText(/Surface temperature of the part/), { target: { value: '19' } });
    expect(within(dewPointLine()).getByText('Go')).toBeTruthy();
    expect(within(dewPointLine()).queryByText('Note')).toBeNull();
  });

  it('the live checklist lists its notes as information under a go', () => {
    const note = 'The surface is 3.8 °C above the dew point (10.7 °C): within the 3 °C limit.';
    render(<ChecklistVerdict evaluation={{ verdict: 'go', problems: [], notes: [note] }} missing={[]} dew={null} units="metric" />);
    expect(screen.getByText('Every check passes.')).toBeTruthy();
    const info = screen.getByText('For information').parentElement!;
    expect(within(info).getByText(note)).toBeTruthy();
  });

  it('the live checklist shows no information block when there are no notes', () => {
    render(<ChecklistVerdict evaluation={{ verdict: 'go', problems: [], notes: [] }} missing={[]} dew={null} units="metric" />);
    expect(screen.queryByText('For information')).toBeNull();
  });
});
