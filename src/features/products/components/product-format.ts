import type { ProductKind } from '../../../../shared/schemas/product';

export const productKindLabels: Record<ProductKind, string> = {
  primer: 'Primer',
  sealer: 'Sealer',
  undercoat: 'Undercoat',
  topcoat: 'Topcoat',
  stain: 'Stain',
  clear: 'Clear',
};

/** "1 : 0" reads as nonsense to a sprayer; a one-component product says so instead. */
export function mixRatioWords(baseParts: number, hardenerParts: number): string {
  if (hardenerParts === 0) return 'One component, no hardener';
  return `${baseParts} : ${hardenerParts} by volume (base : hardener)`;
}

export function fileSizeWords(bytes: number): string {
  if (bytes < 1024) return `${bytes} bytes`;
  if (bytes < 1024 * 1024) return `${Math.round(bytes / 1024)} KB`;
  return `${(bytes / 1024 / 1024).toFixed(1)} MB`;
}

export const documentTitles = {
  tds: { short: 'TDS', long: 'technical data sheet' },
  sds: { short: 'SDS', long: 'safety data sheet' },
} as const;
