import Redis from 'ioredis';

/** The injection token of the one Redis client our own code uses (Bull keeps its own). */
export const REDIS_CLIENT = Symbol('REDIS_CLIENT');

/**
 * A client that fails fast instead of queueing commands while Redis is away: our Redis-backed
 * helpers are optional speed-ups, so a missing Redis must turn into a miss, never a wait.
 */
export function createRedisClient(url: string, onError: (error: Error) => void): Redis {
  const client = new Redis(url, {
    enableOfflineQueue: false,
    maxRetriesPerRequest: 1,
    keyPrefix: 'tallyloom:',
  });
  client.on('error', onError);
  return client;
}
