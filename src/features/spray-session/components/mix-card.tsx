import type { Verdict } from '../../../../shared/finishing/conditions';
import type { Mix } from '../../../../shared/schemas/checklist';
import type { UnitSystem } from '../../../../shared/schemas/common';
import type { Product } from '../../../../shared/schemas/product';
import { formatQuantity } from '../../../../shared/units';
import { shopWhen } from '../utils/session-format';
import { Countdown } from './countdown';
import { verdictBorder, VerdictBadge } from './verdict-badge';
import { mixWords } from '../../../../shared/words';
import { useShopFormat } from '../../../api/settings/use-shop-format';

interface PotState {
  verdict: Verdict;
  /** The badge's word. */
  short: string;
  words: string;
  until: string | null;
  label: string;
}

/** Standing, usable, use soon or over: what the sprayer needs to know about a pot at a glance. */
function potState(mix: Mix, now: Date, timeZone: string): PotState {
  const t = now.getTime();
  if (t < Date.parse(mix.inductionEndsAt)) {
    return { verdict: 'caution', short: 'Standing', words: `Standing (induction): use from ${shopWhen(mix.inductionEndsAt, timeZone, now)}`, until: mix.inductionEndsAt, label: 'Induction' };
  }
  if (!mix.potLifeEndsAt) return { verdict: 'go', short: 'Usable', words: 'Usable: the data sheet gives no pot life', until: null, label: 'Pot life' };
  if (t >= Date.parse(mix.potLifeEndsAt)) {
    return { verdict: 'stop', short: 'Pot life over', words: `Pot life over at ${shopWhen(mix.potLifeEndsAt, timeZone, now)}: do not spray this pot`, until: null, label: 'Pot life' };
  }
  if (mix.potLifeWarningAt && t >= Date.parse(mix.potLifeWarningAt)) {
    return { verdict: 'caution', short: 'Use soon', words: `Use soon: pot life ends ${shopWhen(mix.potLifeEndsAt, timeZone, now)}`, until: mix.potLifeEndsAt, label: 'Pot life' };
  }
  return { verdict: 'go', short: 'Usable', words: `Usable until ${shopWhen(mix.potLifeEndsAt, timeZone, now)}`, until: mix.potLifeEndsAt, label: 'Pot life' };
}

interface MixCardProps {
  mix: Mix;
  product: Product | undefined;
  now: Date;
  timeZone: string;
  units: UnitSystem;
}

export function MixCard({ mix, product, now, timeZone, units }: MixCardProps) {
  const state = potState(mix, now, timeZone);
  // A pot kept on the tablet has a stand-in id below zero until the server gives it one.
  const waiting = mix.id < 0;
  const litres = (l: number) => formatQuantity(l, 'liquidVolume', units);
  const lots = mix.lotIds.map((id) => product?.lots.find((lot) => lot.id === id)?.lotNumber ?? 'a lot no longer on the data sheet');
  const shop = { ...useShopFormat(), timeZone };
  return (
    <article aria-label={`Mix: ${mixWords({ productName: mix.productName, mixedAt: new Date(mix.mixedAt) }, shop)}`} className={`rounded-panel border-2 bg-white p-4 ${verdictBorder[state.verdict]}`}>
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 className="text-lg font-bold">{mix.productName}</h3>
        <VerdictBadge verdict={state.verdict} label={state.short} />
      </div>
      {waiting && <p className="font-bold text-verdict-caution">Waiting to send: kept on this tablet, worked out from the data sheet here.</p>}
      <p className="text-maple-700">
        Mixed {shopWhen(mix.mixedAt, timeZone, now)} by {mix.recordedByName} at {formatQuantity(mix.tempC, 'temperature', units)}
        {lots.length > 0 && `, lot ${lots.join(', ')}`}
      </p>
      <dl className="mt-2 grid grid-cols-2 gap-2 sm:grid-cols-4">
        {[['Base', mix.baseL], ['Hardener', mix.hardenerL], ['Thinner', mix.thinnerL], ['Total', mix.totalL]].map(([term, value]) => (
          <div key={term} className="rounded-panel bg-maple-50 p-2">
            <dt className="text-sm text-maple-700">{term}</dt>
            <dd className="text-lg font-bold">{litres(value as number)}</dd>
          </div>
        ))}
      </dl>
      <p className="mt-3 flex flex-wrap items-center gap-x-3 font-semibold">
        <span>{state.words}</span>
        {state.until && <Countdown label={`${mix.productName} ${state.label.toLowerCase()}`} until={state.until} now={now} overText="over" />}
      </p>
      {mix.potLifeEndsAt && <p className="text-sm text-maple-700">Pot life is an estimate from the data sheet; a large or warm batch can gel sooner.</p>}
    </article>
  );
}
