import { TtlCache } from './ttl-cache';

describe('TtlCache', () => {
  let now = 0;
  const clock = () => now;
  beforeEach(() => {
    now = 1_000;
  });

  it('returns a value until its time-to-live has passed', () => {
    const cache = new TtlCache<string, number>(30_000, 10, clock);
    cache.set('a', 1);
    now += 29_999;
    expect(cache.get('a')).toBe(1);
    now += 1;
    expect(cache.get('a')).toBeUndefined();
  });

  it('evicts the least recently used entry when full', () => {
    const cache = new TtlCache<string, number>(30_000, 2, clock);
    cache.set('a', 1);
    cache.set('b', 2);
    expect(cache.get('a')).toBe(1);
    cache.set('c', 3);
    expect(cache.get('b')).toBeUndefined();
    expect(cache.get('a')).toBe(1);
    expect(cache.get('c')).toBe(3);
  });

  it('deletes one entry or every entry matching a predicate', () => {
    const cache = new TtlCache<string, { team: string }>(30_000, 10, clock);
    cache.set('k1', { team: 'x' });
    cache.set('k2', { team: 'y' });
    cache.set('k3', { team: 'x' });
    cache.deleteWhere((value) => value.team === 'x');
    expect([cache.has('k1'), cache.has('k2'), cache.has('k3')]).toEqual([false, true, false]);
    cache.delete('k2');
    expect(cache.size).toBe(0);
  });

  it('keeps nothing when the time-to-live is zero', () => {
    const cache = new TtlCache<string, number>(0, 10, clock);
    cache.set('a', 1);
    expect(cache.get('a')).toBeUndefined();
  });
});
