import { ArgumentsHost, BadRequestException, ForbiddenException, Logger } from '@nestjs/common';
import { AllExceptionsFilter } from './all-exceptions.filter';

function fakeHost(requestId = 'req-1234567890') {
  const sent: { status?: number; body?: Record<string, unknown> } = {};
  const response = {
    status(code: number) {
      sent.status = code;
      return response;
    },
    json(body: Record<string, unknown>) {
      sent.body = body;
      return response;
    },
  };
  const host = {
    switchToHttp: () => ({
      getRequest: () => ({ id: requestId, originalUrl: '/api/things?x=1' }),
      getResponse: () => response,
    }),
  } as unknown as ArgumentsHost;
  return { host, sent };
}

describe('AllExceptionsFilter', () => {
  beforeEach(() => jest.spyOn(Logger.prototype, 'error').mockImplementation(() => undefined));
  afterEach(() => jest.restoreAllMocks());

  it('answers an unexpected error with 500, the request id and no stack or internal message', () => {
    const { host, sent } = fakeHost('req-abcdef123');
    new AllExceptionsFilter().catch(
      new Error('connection pool exploded at /srv/secret.ts:12'),
      host,
    );
    expect(sent.status).toBe(500);
    expect(sent.body).toMatchObject({
      statusCode: 500,
      error: 'Internal Server Error',
      requestId: 'req-abcdef123',
    });
    const text = JSON.stringify(sent.body);
    expect(text).not.toContain('exploded');
    expect(text).not.toContain('secret.ts');
    expect(String(sent.body?.message)).toContain('req-abcdef123');
  });

  it('keeps the message and field list of an expected HTTP error', () => {
    const { host, sent } = fakeHost();
    const fields = [{ field: 'regionId', messages: ['regionId must be a whole number'] }];
    new AllExceptionsFilter().catch(
      new BadRequestException({ message: 'Invalid input: regionId', fields }),
      host,
    );
    expect(sent.status).toBe(400);
    expect(sent.body).toMatchObject({
      statusCode: 400,
      error: 'Bad Request',
      message: 'Invalid input: regionId',
      fields,
    });
    expect(sent.body?.path).toBe('/api/things?x=1');
  });

  it('uses the standard reason phrase for the status', () => {
    const { host, sent } = fakeHost();
    new AllExceptionsFilter().catch(new ForbiddenException('Not your chapter'), host);
    expect(sent.body).toMatchObject({
      statusCode: 403,
      error: 'Forbidden',
      message: 'Not your chapter',
    });
  });
});
