import { partialMatchKey, type QueryKey } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { changeEventTypes } from '../../../shared/schemas/change-event';
import { changedKeys } from '../../../src/api/changes';
import { everyLiveKey, keysForChange, liveChangeKeys } from '../../../src/api/live-changes';

type Factory = (...args: unknown[]) => { queryKey: QueryKey };

// Every queryOptions the app defines: the resources' in src/api (features compose these, they add none of their own).
const modules = import.meta.glob<Record<string, unknown>>('../../../src/api/**/*.ts', { eager: true });
const factories = Object.entries(modules).flatMap(([file, exports]) =>
  Object.entries(exports)
    .filter(([name, value]) => name.endsWith('QueryOptions') && typeof value === 'function')
    .map(([name, value]) => ({ name: `${file.replace(/^.*src\/api\//, '')} ${name}`, make: value as Factory })),
);

// Sample arguments: an id, a list of ids, a filter object, a tag; the first that builds options is used.
const samples: unknown[][] = [[], [7], [[7, 8]], [{ jobId: 7 }], ['K7M2Q9XP']];

function keysOf(make: Factory): QueryKey[] {
  return samples.flatMap((args) => {
    try {
      const key = make(...args).queryKey;
      return Array.isArray(key) && key.length > 0 ? [key] : [];
    } catch {
      return [];
    }
  });
}

const definedKeys = factories.flatMap((f) => keysOf(f.make));
const matchesSomeQuery = (prefix: QueryKey) => definedKeys.some((key) => partialMatchKey(key, prefix));

describe('query keys', () => {
  it('finds the queries the app defines, each building a key', () => {
    expect(factories.length).toBeGreaterThan(30);
    for (const factory of factories) expect(keysOf(factory.make), factory.name).not.toEqual([]);
  });

  it.each(Object.keys(changedKeys))('every key a %s change invalidates matches a query the app defines', (kind) => {
    for (const prefix of changedKeys[kind as keyof typeof changedKeys]())
      expect(matchesSomeQuery(prefix), JSON.stringify(prefix)).toBe(true);
  });

  it('has live updates for every change the server streams, each matching a query', () => {
    expect(Object.keys(liveChangeKeys).sort()).toEqual([...changeEventTypes].sort());
    for (const prefix of everyLiveKey) expect(matchesSomeQuery(prefix), JSON.stringify(prefix)).toBe(true);
  });

  it('fails for a key no query uses, as the old live updates had', () => {
    expect(matchesSomeQuery(['coat-log-that-is-gone'])).toBe(false);
    expect(matchesSomeQuery(['parts', 'no-such-branch'])).toBe(false);
  });

  it('refreshes the coat log, ready board, planner, Today and job pages when a coat is logged elsewhere', () => {
    const coat = keysForChange('coat.created');
    const refreshed = (probe: QueryKey) => coat.some((prefix) => partialMatchKey(probe, prefix));
    expect(refreshed(['coats', 'list', { spraySessionId: 3 }])).toBe(true);
    expect(refreshed(['ready', 'list', {}])).toBe(true);
    expect(refreshed(['spray-sessions', 'list', { from: 'a', to: 'b' }])).toBe(true);
    expect(refreshed(['today', 'board', 'every-site'])).toBe(true);
    expect(refreshed(['jobs', 'detail', 7])).toBe(true);
    expect(refreshed(['parts', 'history', 7])).toBe(true);
  });

  it('refreshes a data sheet wherever it shows, the spray session’s coat form included, when it changes', () => {
    const product = keysForChange('product.changed');
    const refreshed = (probe: QueryKey) => product.some((prefix) => partialMatchKey(probe, prefix));
    expect(refreshed(['products', 'detail', 5])).toBe(true);
    expect(refreshed(['products', 'list', { page: 1, pageSize: 200 }])).toBe(true);
    expect(refreshed(['finish-systems', 'detail', 2])).toBe(true);
  });

  it('refreshes everything live for a change type it does not know yet', () => {
    expect(keysForChange('something.new')).toBe(everyLiveKey);
  });
});
