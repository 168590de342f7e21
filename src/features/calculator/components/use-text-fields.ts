import { useState } from 'react';

/** The text of a section's boxes, kept as typed, with one change handler per box. */
export function useTextFields<K extends string>(initial: () => Record<K, string>) {
  const [values, setValues] = useState(initial);
  const change = (key: K) => (text: string) => setValues((current) => ({ ...current, [key]: text }));
  return { values, change };
}
