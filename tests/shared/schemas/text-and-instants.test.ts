import { describe, expect, it } from 'vitest';
import { isoInstantSchema, optionalTextSchema, requiredTextSchema } from '../../../shared/schemas/common';
import { createJobSchema } from '../../../shared/schemas/job';

const name = requiredTextSchema('Enter a name', 80);

describe('required text', () => {
  it.each([
    ['zero-width spaces', '\u200B\u200B\u200B'],
    ['a zero-width joiner and a byte-order mark', '\u200D\uFEFF'],
    ['direction marks', '\u200E\u200F\u202E'],
    ['a Hangul filler', '\u3164'],
    ['a braille blank', '\u2800\u2800'],
    ['no-break and ideographic spaces', '\u00A0\u3000'],
    ['a lone combining accent', '\u0301'],
  ])('refuses a value made only of %s', (_label, value) => {
    const result = name.safeParse(value);
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].message).toBe('Enter a name');
  });

  it('trims invisible characters at either end and keeps what is seen, composed', () => {
    expect(name.parse('\u200B Ros Halloran \uFEFF')).toBe('Ros Halloran');
    // e + combining acute becomes the one letter é.
    expect(name.parse('Rene\u0301e')).toBe('Ren\u00E9e');
    expect(name.parse('Łódź Joinery')).toBe('Łódź Joinery');
  });

  it('applies to the shared schemas, such as a job’s customer', () => {
    const result = createJobSchema.safeParse({ customer: '\u200B\u200B', reference: 'LJ-1', dueDate: '2027-01-01' });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => i.path.join('.'))).toContain('customer');
  });

  it('lets optional text be empty after trimming', () => {
    expect(optionalTextSchema(10).parse('\u200B \u200B')).toBe('');
  });
});

describe('ISO instants', () => {
  it.each(['0000-01-01T00:00:00Z', '9999-12-31T23:59:59Z', '1970-01-01T00:00:00Z'])('refuses %s as outside the years a shop records', (value) => {
    expect(isoInstantSchema.safeParse(value).success).toBe(false);
  });

  it('takes an instant with an offset in this century', () => {
    expect(isoInstantSchema.parse('2027-03-01T09:15:00+01:00')).toBe('2027-03-01T09:15:00+01:00');
  });
});
