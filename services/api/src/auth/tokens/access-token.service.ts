import { Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import type { Role } from '@tallyloom/core';
import { AppConfig } from '../../config/app-config';

export const JWT_ISSUER = 'tallyloom';
export const JWT_AUDIENCE = 'tallyloom-api';

export interface AccessTokenPayload {
  sub: number;
  role: Role;
}

@Injectable()
export class AccessTokenService {
  constructor(
    private readonly jwt: JwtService,
    private readonly config: AppConfig,
  ) {}

  /** A short-lived HS256 token; the person is re-read from the database on every request anyway. */
  async issue(userId: number, role: Role): Promise<{ token: string; expiresAt: Date }> {
    const expiresAt = new Date(Date.now() + this.config.accessTokenMinutes * 60_000);
    const payload: AccessTokenPayload = { sub: userId, role };
    const token = await this.jwt.signAsync(payload, {
      secret: this.config.jwtSecret,
      algorithm: 'HS256',
      expiresIn: this.config.accessTokenMinutes * 60,
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
    });
    return { token, expiresAt };
  }
}
