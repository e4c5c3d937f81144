import { Injectable, UnauthorizedException } from '@nestjs/common';
import { PassportStrategy } from '@nestjs/passport';
import { ExtractJwt, Strategy } from 'passport-jwt';
import type { Actor } from '../common/access/actor';
import { AppConfig } from '../config/app-config';
import { ActorLoader } from './actor-loader.service';
import { JWT_AUDIENCE, JWT_ISSUER, type AccessTokenPayload } from './tokens/access-token.service';

@Injectable()
export class JwtStrategy extends PassportStrategy(Strategy) {
  constructor(
    config: AppConfig,
    private readonly actors: ActorLoader,
  ) {
    super({
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      secretOrKey: config.jwtSecret,
      // Only our algorithm: a token claiming "none" or another algorithm is refused outright.
      algorithms: ['HS256'],
      issuer: JWT_ISSUER,
      audience: JWT_AUDIENCE,
      ignoreExpiration: false,
    });
  }

  async validate(payload: AccessTokenPayload): Promise<Actor> {
    const actor = typeof payload.sub === 'number' ? await this.actors.load(payload.sub) : null;
    if (!actor)
      throw new UnauthorizedException('Your account is no longer active; please sign in again.');
    return actor;
  }
}
