import RedisMock from 'ioredis-mock';
import type Redis from 'ioredis';
import { ViewCache, VIEW_CACHE_SECONDS } from './view-cache';

describe('ViewCache', () => {
  let redis: Redis;
  let cache: ViewCache;

  beforeEach(async () => {
    redis = new RedisMock();
    await redis.flushall();
    cache = new ViewCache(redis);
  });

  afterEach(() => redis.disconnect());

  it('builds once, then answers from Redis with the same value', async () => {
    const build = jest.fn(() => Promise.resolve({ figures: { panels: 1234 } }));
    const first = await cache.remember('dashboard:a', build);
    const second = await cache.remember('dashboard:a', build);
    expect(second).toEqual(first);
    expect(build).toHaveBeenCalledTimes(1);
  });

  it('keeps keys apart', async () => {
    await cache.remember('dashboard:a', () => Promise.resolve('a'));
    expect(await cache.remember('dashboard:b', () => Promise.resolve('b'))).toBe('b');
  });

  it('builds anew after invalidate, and never reads the older entry again', async () => {
    let figure = 1;
    const build = () => Promise.resolve({ figure });
    await cache.remember('dashboard:a', build);
    figure = 2;
    expect(await cache.remember('dashboard:a', build)).toEqual({ figure: 1 });
    await cache.invalidate();
    expect(await cache.remember('dashboard:a', build)).toEqual({ figure: 2 });
  });

  it('stores entries with an expiry, so stale generations leave Redis on their own', async () => {
    await cache.remember('dashboard:a', () => Promise.resolve(1));
    const keys = await redis.keys('views:*:dashboard:a');
    expect(keys).toHaveLength(1);
    const ttl = await redis.ttl(keys[0]);
    expect(ttl).toBeGreaterThan(0);
    expect(ttl).toBeLessThanOrEqual(VIEW_CACHE_SECONDS);
  });

  it('treats a failing Redis as a miss: the view is built and no error reaches the caller', async () => {
    const broken = {
      get: jest.fn(() => Promise.reject(new Error('Connection is closed.'))),
      set: jest.fn(),
      incr: jest.fn(() => Promise.reject(new Error('Connection is closed.'))),
    } as unknown as Redis;
    const offline = new ViewCache(broken);
    const build = jest.fn(() => Promise.resolve('built'));
    expect(await offline.remember('dashboard:a', build)).toBe('built');
    expect(await offline.remember('dashboard:a', build)).toBe('built');
    expect(build).toHaveBeenCalledTimes(2);
    await expect(offline.invalidate()).resolves.toBeUndefined();
  });
});
