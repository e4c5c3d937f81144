import type { CookieOptions, Request, Response } from 'express';

export const REFRESH_COOKIE = 'tl_refresh';

function options(request: Request, expires?: Date): CookieOptions {
  return {
    httpOnly: true,
    // Strict: the cookie never rides along on a request started by another site.
    sameSite: 'strict',
    secure: request.secure,
    path: '/api/auth',
    ...(expires ? { expires } : {}),
  };
}

export function readRefreshCookie(request: Request): string | undefined {
  const cookies = request.cookies as Record<string, string> | undefined;
  return cookies?.[REFRESH_COOKIE];
}

export function setRefreshCookie(
  request: Request,
  response: Response,
  secret: string,
  expires: Date,
): void {
  response.cookie(REFRESH_COOKIE, secret, options(request, expires));
}

export function clearRefreshCookie(request: Request, response: Response): void {
  response.clearCookie(REFRESH_COOKIE, options(request));
}
