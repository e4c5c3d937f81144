import {
  ArgumentsHost,
  Catch,
  HttpException,
  HttpStatus,
  Logger,
  type ExceptionFilter,
} from '@nestjs/common';
import type { ApiErrorBody, FieldProblem } from '@tallyloom/core';
import type { Request, Response } from 'express';
import { STATUS_CODES } from 'node:http';

/**
 * Every error leaves as one JSON shape (`ApiErrorBody`). Expected HTTP errors keep their message;
 * anything else is logged with its stack and answered with a 500 that shows only the request id.
 */
@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(exception: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const request = http.getRequest<Request & { id?: string }>();
    const response = http.getResponse<Response>();
    const requestId = request.id ? String(request.id) : undefined;

    const body =
      exception instanceof HttpException
        ? this.fromHttpException(exception)
        : this.unexpected(exception, requestId);
    response
      .status(body.statusCode)
      .json({ ...body, requestId, path: request.originalUrl ?? request.url });
  }

  private fromHttpException(exception: HttpException): ApiErrorBody {
    const statusCode = exception.getStatus();
    const payload = exception.getResponse();
    const error = STATUS_CODES[statusCode] ?? 'Error';
    if (typeof payload === 'string') return { statusCode, error, message: payload };
    const record = payload as { message?: unknown; fields?: FieldProblem[] };
    const message = Array.isArray(record.message)
      ? record.message.map(String).join('; ')
      : typeof record.message === 'string'
        ? record.message
        : error;
    return { statusCode, error, message, ...(record.fields ? { fields: record.fields } : {}) };
  }

  private unexpected(exception: unknown, requestId: string | undefined): ApiErrorBody {
    this.logger.error(
      { err: exception, requestId },
      exception instanceof Error ? exception.stack : String(exception),
    );
    return {
      statusCode: HttpStatus.INTERNAL_SERVER_ERROR,
      error: 'Internal Server Error',
      message: `Something went wrong on our side. Quote request id ${requestId ?? 'unknown'} when you report it.`,
    };
  }
}
