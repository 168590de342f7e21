import type { BoothIdentity } from '../../lib/booth-identity';

/** A booth's patterned swatch, beside its name; decoration only, the name says which booth. */
export function BoothMark({ identity, className = 'h-4 w-4' }: { identity: BoothIdentity | undefined; className?: string }) {
  if (!identity) return null;
  return <span aria-hidden="true" className={`inline-block shrink-0 rounded-sm border ${className}`} style={{ ...identity.band, borderColor: identity.ink }} />;
}
