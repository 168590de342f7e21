/**
 * The server answers everyone on one thread: work over thousands of parts (a whole ready board,
 * a busy week) done in one go holds every other request until it ends. Done in slices, with a turn
 * of the event loop between them, the longest any other request waits is one slice.
 */
// A hundred parts read their coats (about a thousand rows) and work out their readiness in a few
// ms; five hundred held the loop for 30–70 ms, longer than a stall may last.
export const sliceSize = 100;

const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** `work` on each slice of `items` in order, letting the event loop turn between slices; the results in one list. */
export async function mapInSlices<T, R>(items: readonly T[], work: (slice: T[]) => Promise<R[]> | R[]): Promise<R[]> {
  if (items.length <= sliceSize) return work([...items]);
  const results: R[] = [];
  for (let start = 0; start < items.length; start += sliceSize) {
    if (start > 0) await nextTurn();
    results.push(...(await work(items.slice(start, start + sliceSize))));
  }
  return results;
}
