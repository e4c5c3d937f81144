import { Injectable } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createHmac } from 'node:crypto';
import { resolve } from 'node:path';
import { DEFAULT_UPLOADS_DIR } from '../storage/storage-layout';

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

  get appUrl(): string {
    return this.config.get<string>('APP_URL') ?? `http://localhost:${this.port}`;
  }

  get jwtSecret(): string {
    return this.config.getOrThrow('JWT_SECRET');
  }

  get accessTokenMinutes(): number {
    return Number(this.config.getOrThrow('ACCESS_TOKEN_MINUTES'));
  }

  get refreshTokenDays(): number {
    return Number(this.config.getOrThrow('REFRESH_TOKEN_DAYS'));
  }

  get signInLockAfter(): number {
    return Number(this.config.getOrThrow('SIGN_IN_LOCK_AFTER'));
  }

  get signInLockMinutes(): number {
    return Number(this.config.getOrThrow('SIGN_IN_LOCK_MINUTES'));
  }

  get signInThrottlePerMinute(): number {
    return Number(this.config.getOrThrow('SIGN_IN_THROTTLE_PER_MINUTE'));
  }

  get invitationDays(): number {
    return Number(this.config.getOrThrow('INVITATION_DAYS'));
  }

  get passwordResetMinutes(): number {
    return Number(this.config.getOrThrow('PASSWORD_RESET_MINUTES'));
  }

  get smtpUrl(): string | undefined {
    return this.config.get<string>('SMTP_URL');
  }

  get mailFrom(): string {
    return this.config.getOrThrow('MAIL_FROM');
  }

  /** Where uploaded scans are stored. */
  get uploadsDir(): string {
    return resolve(this.config.get<string>('UPLOADS_DIR') ?? DEFAULT_UPLOADS_DIR);
  }

  get uploadMaxBytes(): number {
    return Number(this.config.getOrThrow('UPLOAD_MAX_BYTES'));
  }

  get exportLinkTtlMinutes(): number {
    return Number(this.config.getOrThrow('EXPORT_LINK_TTL_MINUTES'));
  }

  /** Rows per xlsx sheet (Excel's 1,048,576 unless set lower). */
  get exportXlsxRowsPerSheet(): number {
    return Number(this.config.getOrThrow('EXPORT_XLSX_ROWS_PER_SHEET'));
  }

  /** Signs export download links; derived from JWT_SECRET unless set, so it never equals it. */
  get exportLinkSecret(): string {
    return (
      this.config.get<string>('EXPORT_LINK_SECRET') ??
      createHmac('sha256', this.jwtSecret).update('tallyloom export links').digest('hex')
    );
  }

  /** Whether this process runs the job processors ('off': it only enqueues). */
  get jobProcessors(): 'in-process' | 'off' {
    return this.config.getOrThrow('JOB_PROCESSORS');
  }

  get jobLockMs(): number {
    return Number(this.config.getOrThrow('JOB_LOCK_MS'));
  }

  get jobStalledCheckMs(): number {
    return Number(this.config.getOrThrow('JOB_STALLED_CHECK_MS'));
  }
}
