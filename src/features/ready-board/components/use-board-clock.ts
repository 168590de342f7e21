import { useEffect, useRef, useState } from 'react';

const minute = 60_000;

/**
 * The time the board is drawn at. It moves on at each whole minute (countdowns show minutes,
 * and screen readers should not hear them change faster) and at the moment any of `instants`
 * passes, so a part turns "ready to handle" at its time, not up to a minute late. `onPassed`
 * runs then too, to ask the server, whose answer can hold more (a closed window needs a denib).
 */
export function useBoardClock(instants: readonly string[], onPassed?: () => void): Date {
  const [now, setNow] = useState(() => new Date());
  const passedRef = useRef(onPassed);
  useEffect(() => {
    passedRef.current = onPassed;
  });
  const schedule = instants.join('|');

  useEffect(() => {
    const t = Date.now();
    const next = schedule
      .split('|')
      .map((iso) => Date.parse(iso))
      .filter((at) => at > t)
      .reduce((soonest, at) => Math.min(soonest, at), Infinity);
    const nextMinute = (Math.floor(t / minute) + 1) * minute;
    const instantFirst = next <= nextMinute;
    const timer = window.setTimeout(
      () => {
        setNow(new Date());
        if (instantFirst) passedRef.current?.();
      },
      Math.min(next, nextMinute) - t + 20,
    );
    return () => window.clearTimeout(timer);
  }, [now, schedule]);

  return now;
}
