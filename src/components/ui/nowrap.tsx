import type { ReactNode } from 'react';

/** Keeps a number with its unit on one line ("21,600 m³/h", not "21,600" over "m³/h"). */
export function Nowrap({ children }: { children: ReactNode }) {
  return <span className="whitespace-nowrap">{children}</span>;
}
