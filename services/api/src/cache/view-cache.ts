import { Inject, Injectable, Logger } from '@nestjs/common';
import type Redis from 'ioredis';
import { REDIS_CLIENT } from './redis-client';

/** How long a cached view may live even if nothing invalidates it (renames, settings drift). */
export const VIEW_CACHE_SECONDS = 300;
const GENERATION_KEY = 'views:generation';

/**
 * Caches read-only views (dashboards) in Redis under a generation number. Whatever changes the
 * figures — a snapshot rebuild, new settings — bumps the generation, so every older entry is
 * simply never read again and expires on its own. Redis trouble is a miss, never an error.
 */
@Injectable()
export class ViewCache {
  private readonly logger = new Logger('ViewCache');

  constructor(@Inject(REDIS_CLIENT) private readonly redis: Redis) {}

  /** The cached value of `key`, or `build()`'s result, stored for the next reader. */
  async remember<T>(key: string, build: () => Promise<T>): Promise<T> {
    const generation = await this.attempt(() => this.redis.get(GENERATION_KEY));
    if (generation === undefined) return build();
    const entryKey = `views:${generation ?? '0'}:${key}`;
    const cached = await this.attempt(() => this.redis.get(entryKey));
    if (typeof cached === 'string') return JSON.parse(cached) as T;
    const value = await build();
    await this.attempt(() =>
      this.redis.set(entryKey, JSON.stringify(value), 'EX', VIEW_CACHE_SECONDS),
    );
    return value;
  }

  /** Makes every cached view stale; called after figures change and are committed. */
  async invalidate(): Promise<void> {
    await this.attempt(() => this.redis.incr(GENERATION_KEY));
  }

  /** Runs a Redis command; undefined when Redis failed (logged, never thrown). */
  private async attempt<T>(command: () => Promise<T>): Promise<T | undefined> {
    try {
      return await command();
    } catch (error) {
      this.logger.warn(`Redis unavailable, not cached: ${(error as Error).message}`);
      return undefined;
    }
  }
}
