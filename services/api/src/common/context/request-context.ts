import { createParamDecorator, type ExecutionContext } from '@nestjs/common';
import type { Request } from 'express';
import type { Actor } from '../access/actor';

/** Who acts and which request it is: what services need for scope checks and audit entries. */
export interface RequestContext {
  actor: Actor | null;
  requestId: string | null;
  ip: string | null;
}

export function contextOf(request: Request & { user?: Actor; id?: unknown }): RequestContext {
  return {
    actor: request.user ?? null,
    requestId:
      typeof request.id === 'string' || typeof request.id === 'number' ? String(request.id) : null,
    ip: request.ip ?? null,
  };
}

/** Injects the RequestContext of the current request into a controller method. */
export const Ctx = createParamDecorator((_: unknown, context: ExecutionContext) =>
  contextOf(context.switchToHttp().getRequest()),
);

/** A RequestContext whose actor is known to be signed in (routes behind @Allow). */
export interface SignedInContext extends RequestContext {
  actor: Actor;
}
