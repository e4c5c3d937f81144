import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { resolve } from 'node:path';

/** Typed access to the validated environment; the one place that knows the variable names. */
@Injectable()
export class AppConfig {
  constructor(private readonly config: ConfigService) {}

  get nodeEnv(): 'development' | 'production' | 'test' {
    return this.config.getOrThrow('NODE_ENV');
  }

  get port(): number {
    return Number(this.config.getOrThrow('PORT'));
  }

  get host(): string {
    return this.config.getOrThrow('HOST');
  }

  get databaseUrl(): string {
    return this.config.getOrThrow('DATABASE_URL');
  }

  get redisUrl(): string {
    return this.config.getOrThrow('REDIS_URL');
  }

  get logLevel(): string {
    return this.config.getOrThrow('LOG_LEVEL');
  }

  get serveWeb(): boolean {
    const value: unknown = this.config.get('SERVE_WEB');
    return (
      value === true || value === 'true' || (value === undefined && this.nodeEnv === 'production')
    );
  }

  /** The built web app (`npm run build -w packages/web`). */
  get webDistDir(): string {
    return (
      this.config.get<string>('WEB_DIST_DIR') ??
      resolve(__dirname, '..', '..', '..', '..', 'packages', 'web', 'dist')
    );
  }
}
