import { describe, expect, it } from 'vitest';
import { mapInSlices, sliceSize } from '../../../server/lib/in-slices';

describe('mapInSlices', () => {
  it('gives the same results, in the same order, as doing the work in one go', async () => {
    const items = Array.from({ length: sliceSize * 2 + 7 }, (_, i) => i);
    const slices: number[] = [];
    const results = await mapInSlices(items, (slice) => {
      slices.push(slice.length);
      return slice.map((n) => n * 2);
    });
    expect(results).toEqual(items.map((n) => n * 2));
    expect(slices).toEqual([sliceSize, sliceSize, 7]);
  });

  it('lets waiting I/O run between slices of a long list, and not at all for a short one', async () => {
    const order: string[] = [];
    const long = mapInSlices(Array.from({ length: sliceSize + 1 }, (_, i) => i), (slice) => {
      order.push(`slice of ${slice.length}`);
      return slice;
    });
    setImmediate(() => order.push('waiting I/O'));
    await long;
    expect(order).toEqual([`slice of ${sliceSize}`, 'waiting I/O', 'slice of 1']);

    const shortOrder: string[] = [];
    const short = mapInSlices([1, 2, 3], (slice) => {
      shortOrder.push('work');
      return slice;
    });
    setImmediate(() => shortOrder.push('waiting I/O'));
    await short;
    shortOrder.push('done');
    expect(shortOrder.slice(0, 2)).toEqual(['work', 'done']);
  });
});
