import { useEffect, useRef, useState } from 'react';
import { countWords, type StateCounts } from './readiness';

const atMostEvery = 60_000;

/** The text to announce, changed no more than once a minute so a busy board does not talk over the user. */
function useThrottledText(text: string): string {
  const [shown, setShown] = useState(text);
  const lastChange = useRef(0);
  useEffect(() => {
    if (text === shown) return;
    const wait = Math.max(0, lastChange.current + atMostEvery - Date.now());
    const timer = window.setTimeout(() => {
      lastChange.current = Date.now();
      setShown(text);
    }, wait);
    return () => window.clearTimeout(timer);
  }, [text, shown]);
  return shown;
}

/** A polite summary for screen readers: how many parts stand in each state, once the states change. */
export function ReadyAnnouncer({ counts }: { counts: StateCounts }) {
  const words = countWords(counts, ['collected']);
  const text = useThrottledText(words.length ? `On the board: ${words.join(', ')}.` : 'No parts on the board.');
  return (
    <p role="status" aria-live="polite" className="sr-only">
      {text}
    </p>
  );
}
