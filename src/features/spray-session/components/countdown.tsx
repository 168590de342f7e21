import { remainingMinutesWords, remainingWords } from '../utils/session-format';

interface CountdownProps {
  /** What is counted down to, in words: "Flash-off", "Pot life". */
  label: string;
  until: string;
  now: Date;
  /** Said once the time has passed. */
  overText: string;
  large?: boolean;
}

/**
 * The figures tick every second for the eye; screen readers get a separate polite region in
 * whole minutes, so it speaks at most once a minute instead of every tick.
 */
export function Countdown({ label, until, now, overText, large = false }: CountdownProps) {
  const left = Date.parse(until) - now.getTime();
  const over = left <= 0;
  return (
    <span className="inline-flex flex-wrap items-baseline gap-x-2">
      <span aria-hidden="true" className={`font-bold tabular-nums ${large ? 'text-5xl sm:text-6xl' : 'text-lg'}`}>
        {over ? '0:00' : remainingWords(left)}
        <span className="font-sans text-base font-semibold"> left</span>
      </span>
      <span aria-live="polite" className="sr-only">
        {over ? `${label}: ${overText}` : `${label}: ${remainingMinutesWords(left)} left`}
      </span>
    </span>
  );
}
