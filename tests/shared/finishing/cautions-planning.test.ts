import { describe, expect, it } from 'vitest';
import { deferToSdsLine, respiratorLevel, sessionCautions, type CautionBooth } from '../../../shared/finishing/cautions';
import { sessionMinutes } from '../../../shared/finishing/planning';

const booth: CautionBooth = { name: 'Booth 1', clearanceMin: 2.76, clearanceSource: 'computed', minFaceVelocityMps: 0.5, faceVelocityMps: 0.5 };
const pu = { name: '2K PU', chemistry: 'two-component-polyurethane' as const, hazards: ['isocyanate' as const, 'flammable' as const] };
const wb = { name: 'WB primer', chemistry: 'water-borne' as const, hazards: [] };
const nc = { name: 'NC sealer', chemistry: 'solvent-borne' as const, hazards: ['flammable' as const] };

describe('respiratorLevel', () => {
  // UK HSE guidance for isocyanate spraying (HSG276; COSHH essentials MR2) asks for air-fed RPE even in a booth.
  it('asks for air-fed protection whenever an isocyanate product is in the session', () => {
    expect(respiratorLevel([wb, pu])).toBe('air-fed');
  });

  // Combined vapour and particulate filters for solvent-borne coatings: common practice, no published source named here.
  it('asks for combined vapour and particulate filters for solvent-borne products', () => {
    expect(respiratorLevel([wb, nc])).toBe('vapour-and-particulate');
  });

  it('asks for particulate protection at least for water-borne products', () => {
    expect(respiratorLevel([wb])).toBe('particulate');
  });
});

describe('sessionCautions', () => {
  it('covers protection, extraction, clearance and ignition, and ends by deferring to the SDS', () => {
    const cautions = sessionCautions([pu], booth);
    expect(cautions.map((c) => c.code)).toEqual(['respirator-air-fed', 'extraction', 'clearance', 'ignition', 'sensitiser', 'defer']);
    expect(cautions.at(-1)!.message).toBe(deferToSdsLine);
    expect(cautions.find((c) => c.code === 'clearance')!.message).toContain('3 minutes');
  });

  it('asks for a face-velocity measurement when the booth’s open face is not known', () => {
    const cautions = sessionCautions([wb], { ...booth, faceVelocityMps: null });
    expect(cautions.find((c) => c.code === 'extraction')!.message).toMatch(/Measure the face velocity/);
    expect(cautions.some((c) => c.code === 'ignition')).toBe(false);
  });
});

describe('sessionMinutes', () => {
  it('adds spraying time at the booth’s rate to set-up and clean-down, rounded up to 5 minutes', () => {
    // Worked by hand: 30 m² at 24 m²/h = 75 min; + 15 set-up + 20 clean-down = 110 min.
    expect(sessionMinutes({ areaM2: 30, sprayRateM2PerH: 24, setupMin: 15, cleanDownMin: 20 })).toBe(110);
    // 10 m² at 24 m²/h = 25 min; + 15 + 20 = 60 min exactly.
    expect(sessionMinutes({ areaM2: 10, sprayRateM2PerH: 24, setupMin: 15, cleanDownMin: 20 })).toBe(60);
    // 11 m² → 27.5 min → 62.5 → 65.
    expect(sessionMinutes({ areaM2: 11, sprayRateM2PerH: 24, setupMin: 15, cleanDownMin: 20 })).toBe(65);
  });
});
