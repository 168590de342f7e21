import { spraySessionStateLabels, type SpraySessionState } from '../../../../shared/schemas/spray-session';
import type { NextStepDto, TodaySession } from '../../../../shared/schemas/today';
import { formatShopClock } from '../../../lib/shop-time';

const chip: Record<SpraySessionState, string> = {
  planned: 'border-maple-500 bg-white text-maple-900',
  checking: 'border-verdict-caution bg-white text-verdict-caution',
  spraying: 'border-verdict-stop bg-verdict-stop text-white',
  clearing: 'border-verdict-caution bg-verdict-caution text-white',
  done: 'border-verdict-go bg-white text-verdict-go',
  cancelled: 'border-maple-500 bg-white text-maple-700 line-through',
};

export function StateChip({ state }: { state: SpraySessionState }) {
  return <span className={`inline-block rounded-full border-2 px-2 py-0.5 text-sm font-bold whitespace-nowrap ${chip[state]}`}>{spraySessionStateLabels[state]}</span>;
}

/** "09:00–10:05" on the shop's clock. */
export function sessionHours(session: Pick<TodaySession, 'start' | 'end'>, timeZone: string): string {
  return `${formatShopClock(new Date(session.start), timeZone)}–${formatShopClock(new Date(session.end), timeZone)}`;
}

/** The next step in words, with its time on the shop's clock when it leads up to one. */
export function nextStepWords(step: NextStepDto, timeZone: string): string {
  return step.at ? `${step.words} ${formatShopClock(new Date(step.at), timeZone)}` : step.words;
}
