import { describe, expect, it } from 'vitest';
import { evaluateChecklist } from '../../../shared/finishing/checklist';
import { dewPointC } from '../../../shared/finishing/conditions';

const checks = { extractionRunning: true, filtersChecked: true, faceVelocityMps: 0.55, respiratorFitted: true, respiratorKind: 'vapour-and-particulate' as const, overrideReason: null };
const lacquer = { name: 'Clear lacquer', chemistry: 'solvent-borne' as const, hazards: [], minApplicationTempC: 10, maxRelativeHumidityPct: 80 };
const booth = { minFaceVelocityMps: 0.5 };
const dew = dewPointC(20, 50);

describe('evaluateChecklist and the dew-point limit', () => {
  it('is a go 3.1 °C above the dew point, with the closeness as a note rather than a problem', () => {
    // Design limit: surface at least 3 °C above the dew point (ISO 8502-4 practice; ingal.com.au
    // technical manual §13 and coating application guides, trade-reference §1.2, secondary sources).
    const result = evaluateChecklist({ ...checks, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: dew + 3.1 }, booth, [lacquer]);
    expect(result.verdict).toBe('go');
    expect(result.problems).toEqual([]);
    expect(result.notes).toEqual([expect.stringMatching(/^The surface is 3\.1 °C above the dew point .*: within the 3\.0 °C limit/)]);
  });

  it('is a stop 2.9 °C above the dew point, listed as a problem', () => {
    const result = evaluateChecklist({ ...checks, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: dew + 2.9 }, booth, [lacquer]);
    expect(result.verdict).toBe('stop');
    expect(result.problems).toEqual([expect.stringMatching(/^The surface is only 2\.9 °C above the dew point/)]);
    expect(result.notes).toEqual([]);
  });

  it('has no notes when every reading is well inside its limits', () => {
    const result = evaluateChecklist({ ...checks, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 }, booth, [lacquer]);
    expect(result).toEqual({ verdict: 'go', problems: [], notes: [] });
  });
});

describe('evaluateChecklist and respiratory protection', () => {
  it('says in plain words which protection the products need and that what is worn is not enough', () => {
    // An isocyanate product calls for air-fed protection (UK HSE guidance on isocyanate spraying; see cautions.ts).
    const twoPack = { name: '2K topcoat', chemistry: 'two-component-polyurethane' as const, hazards: ['isocyanate' as const], minApplicationTempC: null, maxRelativeHumidityPct: null };
    const result = evaluateChecklist({ ...checks, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19 }, booth, [twoPack]);
    expect(result.problems).toEqual(['These products need air-fed protection; a respirator with vapour and particulate filters is not enough.']);
  });
});
