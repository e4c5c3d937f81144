import { Module } from '@nestjs/common';
import { APP_GUARD } from '@nestjs/core';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { SequelizeModule } from '@nestjs/sequelize';
import { ThrottlerModule } from '@nestjs/throttler';
import { AccessGuard } from '../common/access/access.guard';
import { AppConfig } from '../config/app-config';
import { User } from '../users/models/user.model';
import { ActorLoader } from './actor-loader.service';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { JwtStrategy } from './jwt.strategy';
import { OneTimeLinkService } from './links/one-time-link.service';
import { OneTimeLink } from './models/one-time-link.model';
import { RefreshToken } from './models/refresh-token.model';
import { PasswordPolicyService } from './passwords/password-policy.service';
import { AccessTokenService } from './tokens/access-token.service';
import { RefreshTokenService } from './tokens/refresh-token.service';

@Module({
  imports: [
    SequelizeModule.forFeature([User, RefreshToken, OneTimeLink]),
    PassportModule,
    JwtModule.register({}),
    ThrottlerModule.forRootAsync({
      inject: [AppConfig],
      useFactory: (config: AppConfig) => ({
        throttlers: [{ name: 'default', ttl: 60_000, limit: config.signInThrottlePerMinute }],
      }),
    }),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    ActorLoader,
    JwtStrategy,
    AccessTokenService,
    RefreshTokenService,
    OneTimeLinkService,
    PasswordPolicyService,
    // Deny by default, for every route of every module.
    { provide: APP_GUARD, useClass: AccessGuard },
  ],
  exports: [OneTimeLinkService, PasswordPolicyService, RefreshTokenService],
})
export class AuthModule {}
