import { describe, expect, it } from 'vitest';
import { normaliseTag } from '../../../../src/api/parts/normalise-tag';
import { guessMapping, plainMessage } from '../../../../src/features/parts/components/import-mapping';
import { facesWords, partTotals, spacedTag } from '../../../../src/features/parts/components/part-format';

describe('guessMapping', () => {
  it('matches our names, their labels and common spreadsheet names, ignoring case and spacing', () => {
    expect(guessMapping(['PART', 'Length (mm)', 'width_mm', 'Thickness', 'Qty', 'faces', 'EDGES', 'Type'])).toEqual({
      label: 'PART',
      kind: 'Type',
      lengthMm: 'Length (mm)',
      widthMm: 'width_mm',
      thicknessMm: 'Thickness',
      quantity: 'Qty',
      faces: 'faces',
      edges: 'EDGES',
    });
  });
  it('leaves a column it cannot place unmapped rather than guessing from one letter', () => {
    expect(guessMapping(['Part', 'L', 'W', 'T'])).toMatchObject({ label: 'Part', lengthMm: '', widthMm: '', thicknessMm: '' });
  });
  it('keeps a choice the user made while the new file still has that column', () => {
    const chosen = { ...guessMapping(['Part', 'L']), lengthMm: 'L' };
    expect(guessMapping(['Part', 'L', 'Length'], chosen).lengthMm).toBe('L');
    expect(guessMapping(['Part', 'Length'], chosen).lengthMm).toBe('Length');
  });
});

describe('part words', () => {
  it('rewords the schema library’s own messages', () => {
    expect(plainMessage('quantity', 'Invalid input: expected number, received NaN')).toBe('Enter a whole number of pieces');
    expect(plainMessage('lengthMm', 'The length must be more than 0')).toBe('The length must be more than 0');
  });
  it('describes the coated surfaces and spaces the tag for reading', () => {
    expect(facesWords({ faces: 'one', edges: false })).toBe('One face, no edges');
    expect(facesWords({ faces: 'both', edges: true })).toBe('Both faces, all edges');
    expect(spacedTag('K7M2Q9XP')).toBe('K7M2 Q9XP');
    expect(normaliseTag(' k7m2 q9-xp ')).toBe('K7M2Q9XP');
  });
  it('totals lines, pieces and area', () => {
    expect(partTotals([{ quantity: 2, coatedAreaM2: 1.5 }, { quantity: 3, coatedAreaM2: 0.25 }])).toEqual({ lines: 2, pieces: 5, areaM2: 1.75 });
  });
});
