import { useSyncExternalStore } from 'react';

// Below Tailwind's `sm` a week of columns is too thin to read or drag; the planner shows a day.
const query = '(max-width: 639px)';

function subscribe(onChange: () => void) {
  const list = window.matchMedia(query);
  list.addEventListener('change', onChange);
  return () => list.removeEventListener('change', onChange);
}

export function useNarrowScreen(): boolean {
  return useSyncExternalStore(subscribe, () => window.matchMedia(query).matches);
}
