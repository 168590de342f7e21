import type { Chemistry, Hazard } from '../schemas/product';

export type CautionProduct = { name: string; chemistry: Chemistry; hazards: Hazard[] };
export type CautionBooth = { name: string; clearanceMin: number; clearanceSource: 'measured' | 'computed'; minFaceVelocityMps: number; faceVelocityMps: number | null };

export type Caution = { code: string; title: string; message: string };
export type RespiratorLevel = 'air-fed' | 'vapour-and-particulate' | 'particulate';

/** Always the last word: the product's own papers, the law where the shop is, and a competent person decide. */
export const deferToSdsLine =
  'These are reminders, not a risk assessment. Follow each product’s safety data sheet, your local regulations and the advice of a competent person; where they ask for more, they win.';

const respiratorText: Record<RespiratorLevel, string> = {
  'air-fed': 'Air-fed respiratory protection (a supplied-air hood or visor). Filter masks are not enough for isocyanates, even inside the booth.',
  'vapour-and-particulate': 'A respirator with combined organic-vapour and particulate filters, in date and fit-tested.',
  particulate: 'At least a particulate respirator for the spray mist.',
};

/** The strictest protection any product in the session calls for. */
export function respiratorLevel(products: CautionProduct[]): RespiratorLevel {
  if (products.some((p) => p.hazards.includes('isocyanate'))) return 'air-fed';
  const solventOnly: Chemistry[] = ['water-borne', 'uv-cure'];
  if (products.some((p) => !solventOnly.includes(p.chemistry) || p.hazards.includes('flammable'))) return 'vapour-and-particulate';
  return 'particulate';
}

function airCautions(booth: CautionBooth): Caution[] {
  const measured = booth.faceVelocityMps;
  const velocity =
    measured === null
      ? `Measure the face velocity before spraying; it must be at least ${booth.minFaceVelocityMps.toFixed(2)} m/s.`
      : `Extraction must run and reach at least ${booth.minFaceVelocityMps.toFixed(2)} m/s at the face (worked out: ${measured.toFixed(2)} m/s); check the gauge.`;
  const source = booth.clearanceSource === 'measured' ? 'measured' : 'worked out from volume and extraction; have it measured with smoke';
  return [
    { code: 'extraction', title: 'Extraction and face velocity', message: velocity },
    {
      code: 'clearance',
      title: 'Clearance time',
      message: `After spraying stops, keep extraction on and protection worn, and keep others out of ${booth.name}, for ${Math.ceil(booth.clearanceMin)} minutes (${source}).`,
    },
  ];
}

/** What a spray session's products and booth call for, ending with the line that defers to the SDS. */
export function sessionCautions(products: CautionProduct[], booth: CautionBooth): Caution[] {
  const level = respiratorLevel(products);
  const cautions: Caution[] = [{ code: `respirator-${level}`, title: 'Respiratory protection', message: respiratorText[level] }, ...airCautions(booth)];
  const flammable = products.filter((p) => p.hazards.includes('flammable') || p.chemistry === 'solvent-borne');
  if (flammable.length) {
    cautions.push({ code: 'ignition', title: 'No ignition sources', message: `${flammable.map((p) => p.name).join(', ')}: flammable. No flames, sparks, grinding or non-rated electrics near the booth; earth containers when decanting.` });
  }
  const sensitisers = products.filter((p) => p.hazards.includes('sensitiser') || p.hazards.includes('isocyanate'));
  if (sensitisers.length) {
    cautions.push({ code: 'sensitiser', title: 'Skin and breathing sensitiser', message: 'Wear chemical-resistant gloves and overalls; anyone with asthma or a past reaction to these products must not be in the booth.' });
  }
  if (products.some((p) => p.hazards.includes('formaldehyde'))) {
    cautions.push({ code: 'formaldehyde', title: 'Formaldehyde release', message: 'Acid-catalysed coatings give off formaldehyde while curing: keep freshly sprayed parts in a ventilated drying area.' });
  }
  cautions.push({ code: 'defer', title: 'Safety data sheets come first', message: deferToSdsLine });
  return cautions;
}
