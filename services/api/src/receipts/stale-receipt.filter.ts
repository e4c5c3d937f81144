import { Catch, ConflictException, type ArgumentsHost, type ExceptionFilter } from '@nestjs/common';
import type { ParcelReceiptDetail } from '@tallyloom/core';
import type { Request, Response } from 'express';
import type { ReceiptConflictBody } from './dto/receipt-view.dto';

/** A correction based on an older version: the answer carries the receipt as it is now. */
export class StaleReceiptException extends ConflictException {
  constructor(readonly current: ParcelReceiptDetail) {
    super(
      `Someone changed this receipt since you opened it (it is now version ${current.version}). ` +
        'Review the current values and make your change again.',
    );
  }
}

/**
 * The global filter keeps only the standard error fields; this one adds `current`, so the web
 * app can show what changed without another request.
 */
@Catch(StaleReceiptException)
export class StaleReceiptFilter implements ExceptionFilter {
  catch(exception: StaleReceiptException, host: ArgumentsHost): void {
    const request = host.switchToHttp().getRequest<Request & { id?: string }>();
    const body: ReceiptConflictBody = {
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
