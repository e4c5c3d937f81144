import { ApiError } from '@/lib/api-client';

/**
 * A refused approve or return, in words. The server says why it refused (a 403 here is one's
 * own submission, which another reviewer must decide on); a 409 means the tally changed since
 * the page read it.
 */
export function reviewProblem(error: unknown): string {
  if (!(error instanceof ApiError)) {
    return error instanceof Error ? error.message : 'Something unexpected happened.';
  }
  if (error.statusCode === 409) {
    return 'Someone changed this tally after you opened it. Reload the page and read it again before you decide.';
  }
  return error.message;
}
