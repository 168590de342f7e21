/** General cautions for any spraying; a spray session adds the ones its own products call for. */
const cautions = [
  'Run the extraction before you start and check the face velocity meets the booth’s minimum.',
  'Two-pack products containing isocyanates: wear air-fed breathing equipment, even inside the booth, and keep everyone else out.',
  'Solvent-borne products: wear a fitted mask with combined vapour and particle filters, changed on schedule.',
  'Water-borne products: wear at least a particle filter mask; some still contain flammable solvents.',
  'After spraying stops, wait the full clearance time before lifting your visor or letting anyone in.',
  'Keep flames, sparks and hot work away from flammable coatings, thinners and soaked rags.',
];

export function CautionsBlock() {
  return (
    <section aria-labelledby="calc-cautions" className="rounded-panel border-2 border-verdict-caution bg-white p-4 sm:p-6">
      <h2 id="calc-cautions" className="text-xl font-semibold text-maple-900">
        <span aria-hidden="true">⚠ </span>Cautions
      </h2>
      <ul className="mt-3 list-disc space-y-2 pl-6">
        {cautions.map((caution) => (
          <li key={caution}>{caution}</li>
        ))}
      </ul>
      <p className="mt-4 font-semibold">
        These figures and cautions are a guide only. The product’s safety data sheet, your local regulations and a competent
        person’s advice come first.
      </p>
    </section>
  );
}
