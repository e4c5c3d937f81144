import {
  ForbiddenException,
  Injectable,
  UnauthorizedException,
  type ExecutionContext,
} from '@nestjs/common';
import { Reflector } from '@nestjs/core';
import { AuthGuard } from '@nestjs/passport';
import { can, type Policy } from '@tallyloom/core';
import type { Request } from 'express';
import type { Actor } from './actor';
import { PUBLIC_ROUTE, ROUTE_POLICY, SIGNED_IN } from './access.decorators';

/**
 * The one global guard. Deny by default: a route must declare @Public() or @Allow(policy).
 * Signed-in routes need a valid access token (passport-jwt), then a role that holds the policy.
 */
@Injectable()
export class AccessGuard extends AuthGuard('jwt') {
  constructor(private readonly reflector: Reflector) {
    super();
  }

  override async canActivate(context: ExecutionContext): Promise<boolean> {
    const targets = [context.getHandler(), context.getClass()];
    if (this.reflector.getAllAndOverride<boolean>(PUBLIC_ROUTE, targets)) return true;
    const policy = this.reflector.getAllAndOverride<Policy | typeof SIGNED_IN>(
      ROUTE_POLICY,
      targets,
    );
    if (!policy)
      throw new ForbiddenException('This route declares no access policy, so it is closed.');

    await (super.canActivate(context) as Promise<boolean>); // throws 401 for a missing or bad token
    const actor = context.switchToHttp().getRequest<Request & { user?: Actor }>().user;
    if (!actor) return false;
    if (policy !== SIGNED_IN && !can(actor.role, policy)) {
      throw new ForbiddenException('Your role does not allow this.');
    }
    return true;
  }

  /** passport's own 401 says only "Unauthorized"; say what to do. */
  override handleRequest<TUser>(error: unknown, user: TUser | false): TUser {
    if (error instanceof UnauthorizedException) throw error;
    if (error || !user) {
      throw new UnauthorizedException(
        'Sign in to continue: the access token is missing, invalid or expired.',
      );
    }
    return user;
  }
}
