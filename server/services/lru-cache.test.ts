import { describe, expect, it } from 'vitest';
import { LruCache } from './lru-cache';

describe('LruCache', () => {
  it('keeps its total weight within the bound, letting the least recently used value go first', () => {
    const cache = new LruCache<string, string>(12, (v) => v.length);
    cache.set('a', 'aaa');
    cache.set('b', 'bbb');
    cache.set('c', 'ccc');
    expect(cache.get('a')).toBe('aaa'); // a is now the most recently used
    cache.set('d', 'ddd');
    cache.set('e', 'eee'); // 15 > 12: b, the least recently used, goes
    expect(cache.get('b')).toBeUndefined();
    expect(['a', 'c', 'd', 'e'].map((k) => cache.get(k))).toEqual(['aaa', 'ccc', 'ddd', 'eee']);
    expect(cache.size).toEqual({ count: 4, weight: 12 });
  });

  it('replaces a value under the same key without counting it twice', () => {
    const cache = new LruCache<number, string>(100, (v) => v.length);
    cache.set(1, 'x'.repeat(20));
    cache.set(1, 'y'.repeat(10));
    expect(cache.get(1)).toBe('y'.repeat(10));
    expect(cache.size).toEqual({ count: 1, weight: 10 });
  });

  it('does not keep a value heavier than the largest it may hold', () => {
    const cache = new LruCache<number, string>(100, (v) => v.length, 25);
    cache.set(1, 'small');
    cache.set(2, 'x'.repeat(26));
    expect(cache.get(2)).toBeUndefined();
    expect(cache.get(1)).toBe('small');
  });

  it('counts values when no weight is given', () => {
    const cache = new LruCache<number, object>(8);
    for (let i = 0; i < 20; i++) cache.set(i, { i });
    expect(cache.size.count).toBe(8);
    expect(cache.get(11)).toBeUndefined();
    expect(cache.get(12)).toEqual({ i: 12 });
  });
});
