import { ApiError } from '@/lib/api-client';

/** The server's refusal as lines for a form alert: each field's messages, else its message. */
export function serverProblems(error: unknown): string[] {
  if (error instanceof ApiError) {
    return error.fields?.length
      ? error.fields.flatMap((problem) => problem.messages)
      : [error.message];
  }
  return [error instanceof Error ? error.message : 'The sample could not be drawn.'];
}
