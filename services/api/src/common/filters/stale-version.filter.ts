import { Catch, ConflictException, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { ApiErrorBody } from '@tallyloom/core';
import type { Request, Response } from 'express';

/** A write based on an older version of a row: the 409 answer carries the row as it is now. */
export class StaleVersionException<T> extends ConflictException {
  constructor(
    message: string,
    readonly current: T,
  ) {
    super(message);
  }
}

/**
 * The global filter keeps only the standard error fields; this one adds `current`, so the web
 * app can show what changed without another request.
 */
@Catch(StaleVersionException)
export class StaleVersionFilter implements ExceptionFilter {
  catch(exception: StaleVersionException<unknown>, host: ArgumentsHost): void {
    const request = host.switchToHttp().getRequest<Request & { id?: string }>();
    const body: ApiErrorBody & { current: unknown } = {
      statusCode: 409,
      error: 'Conflict',
      message: exception.message,
      current: exception.current,
      requestId: request.id ? String(request.id) : undefined,
      path: request.originalUrl ?? request.url,
    };
    host.switchToHttp().getResponse<Response>().status(409).json(body);
  }
}
