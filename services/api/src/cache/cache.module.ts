import { Global, Inject, Logger, Module, type OnApplicationShutdown } from '@nestjs/common';
import type Redis from 'ioredis';
import { AppConfig } from '../config/app-config';
import { createRedisClient, REDIS_CLIENT } from './redis-client';
import { ViewCache } from './view-cache';

/** Our own Redis-backed helpers, on REDIS_URL (the same server Bull uses). */
@Global()
@Module({
  providers: [
    {
      provide: REDIS_CLIENT,
      inject: [AppConfig],
      useFactory: (config: AppConfig) => {
        const logger = new Logger('Redis');
        return createRedisClient(config.redisUrl, (error) => logger.warn(error.message));
      },
    },
    ViewCache,
  ],
  exports: [ViewCache],
})
export class CacheModule implements OnApplicationShutdown {
  constructor(@Inject(REDIS_CLIENT) private readonly redis: Redis) {}

  onApplicationShutdown(): void {
    this.redis.disconnect();
  }
}
