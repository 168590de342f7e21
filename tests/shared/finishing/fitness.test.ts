import { describe, expect, it } from 'vitest';
import { evaluateChecklist } from '../../../shared/finishing/checklist';
import { assessFitness, recordStatus, type FitnessInput, type SprayerFacts } from '../../../shared/finishing/fitness';

const fineSprayer: SprayerFacts = {
  fitTest: { nextDueOn: '2026-03-01', passed: true },
  surveillance: { nextDueOn: '2026-03-01', passed: true },
  trainings: [{ title: 'Isocyanate awareness', nextDueOn: null }],
};

function input(changes: Partial<FitnessInput> = {}): FitnessInput {
  return {
    today: '2025-06-02',
    sessionDay: '2025-06-02',
    dueSoonDays: 30,
    booth: {
      banks: [{ name: 'Arrestor pads', status: 'ok', currentPa: 120, changeAtPa: 250 }],
      extractionTest: { nextDueOn: '2026-05-01', passed: true, meanFaceVelocityMps: 0.52, minFaceVelocityMps: 0.5 },
      fireInspection: { nextDueOn: '2026-01-15', passed: true },
    },
    sprayer: fineSprayer,
    respirator: 'vapour-and-particulate',
    isocyanate: false,
    ...changes,
  };
}

const codes = (i: FitnessInput) => assessFitness(i).findings.map((f) => `${f.severity}:${f.code}`);

describe('assessFitness: the booth', () => {
  it('says go when the filters, the extraction test, the fire inspection and the sprayer are all in order', () => {
    expect(assessFitness(input())).toEqual({ verdict: 'go', findings: [] });
  });

  it('stops at a filter bank at or past its change-at pressure drop and cautions near it', () => {
    // Rule: the booth or filter maker's change-at figure; near from 80 % (common practice, no published source).
    const banks = (status: 'over-limit' | 'near-limit', currentPa: number) => ({ booth: { ...input().booth, banks: [{ name: 'Arrestor pads', status, currentPa, changeAtPa: 250 }] } });
    const over = assessFitness(input(banks('over-limit', 262)));
    expect(over.verdict).toBe('stop');
    expect(over.findings[0].message).toBe('Filter bank “Arrestor pads” reads 262 Pa against its change-at 250 Pa: change the filters before spraying.');
    expect(codes(input(banks('near-limit', 215)))).toEqual(['caution:filter-near-limit']);
  });

  it('stops when the extraction test has lapsed or measured below the minimum, and cautions when it is due soon or missing', () => {
    // HSE HSG258: thorough examination and test at least every 14 months (the due date carries it).
    const test = (changes: object) => ({ booth: { ...input().booth, extractionTest: { ...input().booth.extractionTest!, ...changes } } });
    expect(codes(input(test({ nextDueOn: '2025-06-01' })))).toEqual(['stop:extraction-lapsed']);
    expect(codes(input(test({ nextDueOn: '2025-06-30' })))).toEqual(['caution:extraction-due-soon']);
    expect(codes(input(test({ meanFaceVelocityMps: 0.41 })))).toEqual(['stop:extraction-below-minimum']);
    expect(codes(input({ booth: { ...input().booth, extractionTest: null } }))).toEqual(['caution:extraction-none']);
  });

  it('stops on a lapsed or failed fire-protection inspection', () => {
    const fire = (fireInspection: { nextDueOn: string; passed: boolean }) => ({ booth: { ...input().booth, fireInspection } });
    expect(codes(input(fire({ nextDueOn: '2025-05-31', passed: true })))).toEqual(['stop:fire-lapsed']);
    expect(codes(input(fire({ nextDueOn: '2026-05-31', passed: false })))).toEqual(['stop:fire-failed']);
  });

  it('cautions, for a session booked ahead, when a record lapses before the session’s day', () => {
    const ahead = input({ sessionDay: '2026-01-20' });
    expect(codes(ahead)).toEqual(['caution:fire-lapses-first']);
  });
});

describe('assessFitness: the sprayer', () => {
  const sprayer = (changes: Partial<SprayerFacts>) => ({ sprayer: { ...fineSprayer, ...changes } });

  it('stops a tight-fitting respirator without a valid, passed fit test', () => {
    // A tight-fitting facepiece must be fit-tested to its wearer (UK HSE and US OSHA 1910.134, from memory).
    expect(codes(input(sprayer({ fitTest: { nextDueOn: '2025-06-01', passed: true } })))).toEqual(['stop:fit-test-lapsed']);
    expect(codes(input(sprayer({ fitTest: { nextDueOn: '2026-06-01', passed: false } })))).toEqual(['stop:fit-test-failed']);
    expect(codes(input(sprayer({ fitTest: null })))).toEqual(['stop:fit-test-none']);
    expect(codes(input(sprayer({ fitTest: { nextDueOn: '2025-06-20', passed: true } })))).toEqual(['caution:fit-test-due-soon']);
  });

  it('only cautions about the fit test with air-fed protection, saying it applies to a tight-fitting facepiece if one is worn', () => {
    const airFed = assessFitness(input({ respirator: 'air-fed', ...sprayer({ fitTest: { nextDueOn: '2025-01-01', passed: true } }) }));
    expect(airFed.verdict).toBe('caution');
    expect(airFed.findings[0].message).toBe('The sprayer’s face-fit test has lapsed. With air-fed protection this applies only to a tight-fitting facepiece, if one is worn.');
  });

  it('stops isocyanate work without health surveillance in date, and ignores surveillance for other products', () => {
    // HSE COSHH essentials MR2 and HSG276: only people under health surveillance spray isocyanates.
    const lapsed = sprayer({ surveillance: { nextDueOn: '2025-05-01', passed: true } });
    expect(codes(input({ ...lapsed, isocyanate: true, respirator: 'air-fed' }))).toEqual(['stop:surveillance-lapsed']);
    expect(codes(input({ ...sprayer({ surveillance: null }), isocyanate: true, respirator: 'air-fed' }))).toEqual(['stop:surveillance-none']);
    expect(codes(input({ ...lapsed, isocyanate: false }))).toEqual([]);
  });

  it('only cautions about lapsed training', () => {
    expect(codes(input(sprayer({ trainings: [{ title: 'Spray gun set-up', nextDueOn: '2025-01-01' }] })))).toEqual(['caution:training-lapsed']);
  });

  it('cautions that nobody is assigned, and says nothing of a sprayer whose records the viewer may not see', () => {
    expect(codes(input({ sprayer: null }))).toEqual(['caution:sprayer-none']);
    expect(codes(input({ sprayer: 'hidden', isocyanate: true }))).toEqual([]);
  });

  it('never puts a date or a respirator model in what it says about the sprayer, so a lead sees only the status', () => {
    const all = assessFitness(input({ ...sprayer({ fitTest: { nextDueOn: '2025-06-01', passed: true }, surveillance: null }), isocyanate: true }));
    for (const finding of all.findings.filter((f) => f.subject === 'sprayer')) expect(finding.message).not.toMatch(/\d{4}-\d{2}-\d{2}|\d{1,2} \w+ \d{4}/);
  });
});

describe('recordStatus', () => {
  it('gives the status a lead may see: a failed fit test counts as lapsed, a record with no due date stays valid', () => {
    expect(recordStatus(null, '2025-06-02', 30)).toBe('none');
    expect(recordStatus({ nextDueOn: '2026-06-02', passed: false }, '2025-06-02', 30)).toBe('lapsed');
    expect(recordStatus({ nextDueOn: null, passed: true }, '2025-06-02', 30)).toBe('valid');
    expect(recordStatus({ nextDueOn: '2025-06-20', passed: true }, '2025-06-02', 30)).toBe('due-soon');
  });
});

describe('evaluateChecklist with fit-to-spray findings', () => {
  it('turns a fit-to-spray stop into a checklist stop and leaves cautions out of the verdict', () => {
    const checklist = { extractionRunning: true, filtersChecked: true, faceVelocityMps: 0.55, respiratorFitted: true, respiratorKind: 'vapour-and-particulate' as const, airTempC: 20, relativeHumidityPct: 50, surfaceTempC: 19, overrideReason: null };
    const product = { name: 'Clear lacquer', chemistry: 'solvent-borne' as const, hazards: [], minApplicationTempC: 10, maxRelativeHumidityPct: 80 };
    const lapsed = assessFitness(input({ ...{ sprayer: { ...fineSprayer, fitTest: { nextDueOn: '2025-01-01', passed: true } } } })).findings;
    const result = evaluateChecklist(checklist, { minFaceVelocityMps: 0.5 }, [product], lapsed);
    expect(result.verdict).toBe('stop');
    expect(result.problems).toContain('The sprayer’s face-fit test has lapsed.');
    const dueSoon = assessFitness(input({ sprayer: { ...fineSprayer, fitTest: { nextDueOn: '2025-06-10', passed: true } } })).findings;
    expect(evaluateChecklist(checklist, { minFaceVelocityMps: 0.5 }, [product], dueSoon).verdict).toBe('go');
  });
});
