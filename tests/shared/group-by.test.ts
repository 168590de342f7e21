import { describe, expect, it } from 'vitest';
import { groupBy } from '../../shared/group-by';

// Bookkeeping, not trade maths: the expected groups are written out by hand from the items.
describe('groupBy', () => {
  const parts = [
    { id: 1, jobId: 7 },
    { id: 2, jobId: 9 },
    { id: 3, jobId: 7 },
  ];

  it('gathers items by key, each group in the items’ order, keys in first-seen order', () => {
    const byJob = groupBy(parts, (p) => p.jobId);
    expect([...byJob.keys()]).toEqual([7, 9]);
    expect(byJob.get(7)).toEqual([parts[0], parts[2]]);
    expect(byJob.get(9)).toEqual([parts[1]]);
  });

  it('keeps what `valueOf` picks of each item, and gives an empty map for no items', () => {
    expect(
      groupBy(
        parts,
        (p) => p.jobId,
        (p) => p.id,
      ),
    ).toEqual(
      new Map([
        [7, [1, 3]],
        [9, [2]],
      ]),
    );
    expect(groupBy([], () => 0).size).toBe(0);
  });
});
