import type { UnitSystem } from '../../../../shared/schemas/common';
import type { ReportRequest } from '../utils/report-request';
import { AreaSprayedReport } from './area-sprayed-report';
import { BoothUseReport } from './booth-use-report';
import { ConditionsReport } from './conditions-report';
import { MaterialReport } from './material-report';
import { ReworkReport } from './rework-report';
import { SolventReport } from './solvent-report';
import { UpkeepReport } from './upkeep-report';

export function ReportBody({ request, units, timeZone }: { request: ReportRequest; units: UnitSystem; timeZone: string }) {
  switch (request.kind) {
    case 'booth-use':
      return <BoothUseReport params={request.params} timeZone={timeZone} />;
    case 'area-sprayed':
      return <AreaSprayedReport params={request.params} units={units} timeZone={timeZone} />;
    case 'conditions':
      return <ConditionsReport params={request.params} units={units} timeZone={timeZone} />;
    case 'solvent':
      return <SolventReport params={request.params} units={units} timeZone={timeZone} />;
    case 'material':
      return <MaterialReport params={request.params} units={units} timeZone={timeZone} />;
    case 'rework':
      return <ReworkReport params={request.params} timeZone={timeZone} />;
    case 'upkeep':
      return <UpkeepReport params={request.params} timeZone={timeZone} />;
  }
}
