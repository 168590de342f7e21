import type { Booth } from '../../../../shared/schemas/booth';
import type { UnitSystem } from '../../../../shared/schemas/common';
import { PageHeader } from '../../../components/ui/page-header';
import { CautionsBlock } from './cautions-block';
import { ClearanceSection } from './clearance-section';
import { ConditionsSection } from './conditions-section';
import { FilmMaterialSection } from './film-material-section';
import { MixSection } from './mix-section';

/**
 * The finishing sums a sprayer or lead needs at the booth, in the user's own units. Sections
 * are keyed by the unit system so their boxes restart in the new units if it changes.
 */
export function CalculatorPage({ units, booths }: { units: UnitSystem; booths: Booth[] }) {
  const unitWords = units === 'metric' ? 'metric units' : 'US units';
  return (
    <div className="space-y-6">
      <PageHeader title="Calculator" description={`Conditions, film, mix and clearance, worked out in ${unitWords}. Results update as you type.`} />
      <ConditionsSection key={`conditions-${units}`} units={units} />
      <FilmMaterialSection key={`film-${units}`} units={units} />
      <MixSection key={`mix-${units}`} units={units} />
      <ClearanceSection key={`clearance-${units}`} units={units} booths={booths} />
      <CautionsBlock />
    </div>
  );
}
