import { filterBankKindLabels, type FilterBank } from '../../../../shared/schemas/upkeep';
import { Button } from '../../../components/ui/button';
import { StatusBadge } from '../../../components/ui/status-badge';
import { formatShopDateTime } from '../../../lib/shop-time';
import { filterLabel, filterTone, pascals } from './upkeep-format';

export type BankAction = 'reading' | 'change' | 'edit';

interface FilterBankCardProps {
  bank: FilterBank;
  timeZone: string;
  canLog: boolean;
  canEdit: boolean;
  onAction: (action: BankAction, bank: FilterBank) => void;
}

/** How loaded a bank is against its change-at pressure drop, as a bar with its figures in words. */
function GaugeBar({ bank }: { bank: FilterBank }) {
  const share = bank.currentPa === null ? 0 : Math.min(bank.currentPa / bank.changeAtPa, 1);
  const colour = bank.status === 'over-limit' ? 'bg-verdict-stop' : bank.status === 'near-limit' ? 'bg-verdict-caution' : 'bg-verdict-go';
  return (
    <div>
      <div className="h-3 overflow-hidden rounded-full bg-maple-200" aria-hidden="true">
        <div className={`h-full ${colour}`} style={{ width: `${Math.round(share * 100)}%` }} />
      </div>
      <p className="mt-1 text-maple-800">
        Gauge {pascals(bank.currentPa)} of {bank.changeAtPa} Pa change-at
      </p>
    </div>
  );
}

export function FilterBankCard({ bank, timeZone, canLog, canEdit, onAction }: FilterBankCardProps) {
  return (
    <li aria-label={`Filter bank ${bank.name}`} className={`space-y-2 rounded-panel border-2 bg-white p-4 ${bank.active ? 'border-maple-300' : 'border-dashed border-maple-300 opacity-80'}`}>
      <div className="flex flex-wrap items-start justify-between gap-2">
        <div>
          <h3 className="text-lg font-semibold">{bank.name}</h3>
          <p className="text-sm text-maple-700">{filterBankKindLabels[bank.kind]}</p>
        </div>
        {bank.active ? <StatusBadge tone={filterTone[bank.status]}>{filterLabel(bank.status)}</StatusBadge> : <StatusBadge tone="quiet">Retired</StatusBadge>}
      </div>
      <GaugeBar bank={bank} />
      <p className="text-sm text-maple-800">
        {bank.latestReading ? `Last reading ${formatShopDateTime(bank.latestReading.at, timeZone)} (${bank.latestReading.source === 'sensor' ? 'sensor' : bank.latestReading.recordedByName})` : 'No gauge reading yet.'}
        <br />
        {bank.lastChange ? `Filters changed ${formatShopDateTime(bank.lastChange.changedAt, timeZone)} by ${bank.lastChange.changedByName}` : 'No filter change logged yet.'}
      </p>
      {((bank.active && canLog) || canEdit) && (
        <div className="flex flex-wrap gap-2">
          {bank.active && canLog && (
            <>
              <Button variant="secondary" onClick={() => onAction('reading', bank)} aria-label={`Log a gauge reading for ${bank.name}`}>
                Log reading
              </Button>
              <Button variant="secondary" onClick={() => onAction('change', bank)} aria-label={`Log a filter change for ${bank.name}`}>
                Filters changed
              </Button>
            </>
          )}
          {canEdit && (
            <Button variant="quiet" onClick={() => onAction('edit', bank)} aria-label={`Edit ${bank.name}`}>
              Edit
            </Button>
          )}
        </div>
      )}
    </li>
  );
}
