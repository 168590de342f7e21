import { requirePositive } from './validate';

export type PartGeometry = {
  lengthMm: number;
  widthMm: number;
  thicknessMm: number;
  quantity: number;
  faces: 'one' | 'both';
  edges: boolean;
};

/**
 * Coated area of one piece, in m². A face is length × width. "one" coats one face, "both"
 * coats the two faces. Edges, when coated, are all four: the perimeter 2·(length + width)
 * times the thickness. Profiles and mouldings are approximated by their bounding box.
 */
export function pieceAreaM2({ lengthMm, widthMm, thicknessMm, faces, edges }: Omit<PartGeometry, 'quantity'>): number {
  requirePositive('lengthMm', lengthMm, 'the length');
  requirePositive('widthMm', widthMm, 'the width');
  requirePositive('thicknessMm', thicknessMm, 'the thickness');
  const faceMm2 = lengthMm * widthMm * (faces === 'both' ? 2 : 1);
  const edgeMm2 = edges ? 2 * (lengthMm + widthMm) * thicknessMm : 0;
  return (faceMm2 + edgeMm2) / 1_000_000;
}

/** All pieces of a part line. */
export function coatedAreaM2(part: PartGeometry): number {
  requirePositive('quantity', part.quantity, 'the quantity');
  return pieceAreaM2(part) * part.quantity;
}
