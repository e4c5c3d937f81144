import { Catch, ConflictException, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { TallyConflictBody, TallyDetail } from '@tallyloom/core';
import type { Request, Response } from 'express';

/** A write based on an older version: the answer carries the tally as it is now. */
export class StaleTallyException extends ConflictException {
  constructor(readonly current: TallyDetail) {
    super(
      `Someone changed this tally since you opened it (it is now version ${current.version}). ` +
        'Review the current figures and make your change again.',
    );
  }
}

/**
 * The global filter keeps only the standard error fields; this one adds `current`, so the form
 * can show what changed without another request.
 */
@Catch(StaleTallyException)
export class StaleTallyFilter implements ExceptionFilter {
  catch(exception: StaleTallyException, host: ArgumentsHost): void {
    const request = host.switchToHttp().getRequest<Request & { id?: string }>();
    const body: TallyConflictBody & { path: string } = {
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
