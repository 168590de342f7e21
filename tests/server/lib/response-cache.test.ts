import { describe, expect, it } from 'vitest';
import {
  cacheBoundMs,
  clearedByOf,
  clockBoundMs,
  keepUntil,
  nextInstantAfter,
  staleSiteOf,
  toCachedAnswer,
} from '../../../server/registry/cached-answers';
import { oneSite } from '../../../server/lib/site-scope';
import { ResponseCache } from '../../../server/lib/response-cache';

const answer = (text: string) => toCachedAnswer({ text });
const t0 = Date.parse('2027-04-05T08:00:00Z');

function cacheAt(maxBytes = 1_000_000) {
  const clock = { ms: t0 };
  return { clock, cache: new ResponseCache(maxBytes, () => clock.ms) };
}

describe('ResponseCache', () => {
  it('lets a request wait for the same answer under way, only while no clear has happened since it began', async () => {
    const { cache } = cacheAt();
    let finish: (value: ReturnType<typeof answer> | undefined) => void = () => {};
    const work = new Promise<ReturnType<typeof answer> | undefined>((resolve) => (finish = resolve));
    cache.workingOn('board', cache.stamp(), work);
    const waiting = cache.underWayFor('board');
    expect(waiting).toBe(work);
    expect(cache.underWayFor('another address')).toBeUndefined();
    // After a change, the answer under way may be from before it: a new request works it out afresh.
    cache.clear(null);
    expect(cache.underWayFor('board')).toBeUndefined();
    finish(answer('a'));
    expect((await waiting)?.body.toString()).toBe('{"text":"a"}');
    expect(cache.underWayFor('board')).toBeUndefined();
  });

  it('forgets the work once it settles, and keeps a newer one for the same key', async () => {
    const { cache } = cacheAt();
    const done = Promise.resolve(answer('a'));
    cache.workingOn('list', cache.stamp(), done);
    expect(cache.underWayFor('list')).toBe(done);
    await done;
    await Promise.resolve();
    expect(cache.underWayFor('list')).toBeUndefined();

    let finishOld: (value: undefined) => void = () => {};
    const old = new Promise<undefined>((resolve) => (finishOld = resolve));
    cache.workingOn('board', cache.stamp(), old);
    cache.clear(null);
    const newer = new Promise<ReturnType<typeof answer>>(() => {});
    cache.workingOn('board', cache.stamp(), newer);
    finishOld(undefined);
    await old;
    await Promise.resolve();
    expect(cache.underWayFor('board')).toBe(newer);
  });

  it('serves an entry until its time, then never again', () => {
    const { clock, cache } = cacheAt();
    cache.set('k', answer('a'), 1, t0 + 1000, cache.stamp());
    clock.ms = t0 + 999;
    expect(cache.get('k')?.body.toString()).toBe('{"text":"a"}');
    clock.ms = t0 + 1000;
    expect(cache.get('k')).toBeUndefined();
    expect(cache.heldBytes).toBe(0);
  });

  it('clears one site’s entries and those reading across sites, and everything on a group-wide change', () => {
    const { cache } = cacheAt();
    const stamp = cache.stamp();
    cache.set('site 1', answer('1'), 1, t0 + 1000, stamp);
    cache.set('site 2', answer('2'), 2, t0 + 1000, stamp);
    cache.set('across', answer('x'), 'any', t0 + 1000, stamp);
    cache.clear(1);
    expect([cache.get('site 1'), cache.get('site 2'), cache.get('across')].map(Boolean)).toEqual([false, true, false]);
    cache.clear(null);
    expect(cache.size).toBe(0);
  });

  it('does not keep what a read found when a clear came while it ran', () => {
    const { cache } = cacheAt();
    const stamp = cache.stamp();
    cache.clear(7);
    cache.set('k', answer('old'), 1, t0 + 1000, stamp);
    expect(cache.get('k')).toBeUndefined();
    cache.set('k', answer('new'), 1, t0 + 1000, cache.stamp());
    expect(cache.get('k')?.body.toString()).toContain('new');
  });

  it('holds no more bytes than its bound, dropping the least recently used first', () => {
    const one = answer('x'.repeat(1000));
    const { cache } = cacheAt(3 * (one.body.length + 210));
    for (const key of ['a', 'b', 'c']) cache.set(key, one, 1, t0 + 1000, cache.stamp());
    expect(cache.get('a')).toBeDefined();
    cache.set('d', one, 1, t0 + 1000, cache.stamp());
    expect(cache.get('b')).toBeUndefined();
    expect(['a', 'c', 'd'].map((k) => Boolean(cache.get(k)))).toEqual([true, true, true]);
    expect(cache.heldBytes).toBeLessThanOrEqual(cache.maxBytes);
    const huge = answer('y'.repeat(cache.maxBytes));
    cache.set('huge', huge, 1, t0 + 1000, cache.stamp());
    expect(cache.get('huge')).toBeUndefined();
    expect(cache.get('a')).toBeDefined();
  });

  it('keeps nothing when its bound is 0', () => {
    const { cache } = cacheAt(0);
    cache.set('k', answer('a'), 1, t0 + 1000, cache.stamp());
    expect(cache.size).toBe(0);
  });
});

describe('how long an answer is kept', () => {
  it('keeps a clock-dependent answer until the first instant in it still to come', () => {
    const body = {
      items: [
        {
          handleAt: '2027-04-05T08:00:05.000Z',
          packAt: '2027-04-05T09:00:00.000Z',
          collectedAt: '2027-04-04T08:00:00.000Z',
          due: '2027-04-05',
        },
      ],
    };
    expect(nextInstantAfter(body, t0)).toBe(Date.parse('2027-04-05T08:00:05.000Z'));
    expect(keepUntil({ clearedBy: 'any', clock: true }, body, t0)).toBe(t0 + 5000);
    // At that instant the part's state moves on: the next answer is worked out afresh.
    expect(keepUntil({ clearedBy: 'any', clock: true }, body, t0 + 5000)).toBe(t0 + 5000 + clockBoundMs);
  });

  it('bounds a clock-dependent answer with nothing to come, and any other answer by the longer bound', () => {
    expect(keepUntil({ clearedBy: 'any', clock: true }, { items: [] }, t0)).toBe(t0 + clockBoundMs);
    expect(keepUntil({ clearedBy: 'site' }, { at: '2027-04-05T08:00:01Z' }, t0)).toBe(t0 + cacheBoundMs);
  });

  it('reads instants with an offset and ignores text that only looks like one', () => {
    expect(nextInstantAfter(['2027-04-05T10:00:00+02:00', 'T2027-04-05', 'note 2027-04-05T09:00:00Z'], t0 - 1)).toBe(
      t0,
    );
  });
});

describe('which changes clear an answer', () => {
  it('ties a site answer to the caller’s site and an admin’s look across sites to every change', () => {
    expect(clearedByOf({ clearedBy: 'site' }, oneSite(2))).toBe(2);
    expect(clearedByOf({ clearedBy: 'site' }, { siteId: null, homeSiteId: 1, allSites: true })).toBe('any');
    expect(clearedByOf({ clearedBy: 'site' }, { siteId: 3, homeSiteId: 1, allSites: true })).toBe(3);
    expect(clearedByOf({ clearedBy: 'any' }, oneSite(2))).toBe('any');
  });

  it('makes a non-admin’s write on a site route stale their own site, and every other write every site', () => {
    expect(staleSiteOf('site', oneSite(2))).toBe(2);
    expect(staleSiteOf('group', oneSite(2))).toBeNull();
    expect(staleSiteOf('own', oneSite(2))).toBeNull();
    expect(staleSiteOf('site', { siteId: 2, homeSiteId: 1, allSites: true })).toBeNull();
  });
});
