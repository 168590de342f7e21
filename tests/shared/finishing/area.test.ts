import { describe, expect, it } from 'vitest';
import { FinishingInputError } from '../../../shared/errors';
import { coatedAreaM2, pieceAreaM2 } from '../../../shared/finishing/area';

// The area rule is our own definition (a face is length × width; edges are the four edges,
// perimeter × thickness). Expected values are worked by hand, digit by digit, below.
describe('pieceAreaM2', () => {
  it('counts one face as length × width', () => {
    // 1000 mm × 500 mm = 500 000 mm² = 0.5 m²
    expect(pieceAreaM2({ lengthMm: 1000, widthMm: 500, thicknessMm: 18, faces: 'one', edges: false })).toBeCloseTo(0.5, 12);
  });

  it('doubles it for both faces', () => {
    expect(pieceAreaM2({ lengthMm: 1000, widthMm: 500, thicknessMm: 18, faces: 'both', edges: false })).toBeCloseTo(1.0, 12);
  });

  it('adds the four edges as perimeter × thickness', () => {
    // edges: 2 × (1000 + 500) × 18 = 54 000 mm² = 0.054 m²; plus one face 0.5 m²
    expect(pieceAreaM2({ lengthMm: 1000, widthMm: 500, thicknessMm: 18, faces: 'one', edges: true })).toBeCloseTo(0.554, 12);
  });

  it('works a kitchen door: 715 × 496 × 18, both faces and edges', () => {
    // faces 2 × 715 × 496 = 709 280 mm²; edges 2 × 1211 × 18 = 43 596 mm²; total 752 876 mm²
    expect(pieceAreaM2({ lengthMm: 715, widthMm: 496, thicknessMm: 18, faces: 'both', edges: true })).toBeCloseTo(0.752876, 12);
  });
});

describe('coatedAreaM2', () => {
  it('multiplies by the quantity', () => {
    expect(coatedAreaM2({ lengthMm: 715, widthMm: 496, thicknessMm: 18, faces: 'both', edges: true, quantity: 3 })).toBeCloseTo(2.258628, 12);
  });

  it('refuses a size of zero with the field named', () => {
    expect(() => pieceAreaM2({ lengthMm: 0, widthMm: 500, thicknessMm: 18, faces: 'one', edges: false })).toThrow(FinishingInputError);
    try {
      coatedAreaM2({ lengthMm: 10, widthMm: 10, thicknessMm: 10, faces: 'one', edges: false, quantity: 0 });
    } catch (error) {
      expect((error as FinishingInputError).field).toBe('quantity');
    }
  });
});
