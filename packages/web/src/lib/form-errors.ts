import type { FieldProblem } from '@tallyloom/core';
import { ApiError } from './api-client';

export interface FormProblems<F extends string> {
  /** One message per field on the form, to show under that field. */
  fields: Partial<Record<F, string>>;
  /** What belongs to no field on the form: the server's general message and any other fields. */
  general: string[];
}

/**
 * Sorts a failed submission into messages for the form's own fields and the rest. The server
 * names fields as the request did (`email`, `newPassword`); `aliases` maps other names onto
 * the form's fields.
 */
export function formProblems<F extends string>(
  error: unknown,
  formFields: readonly F[],
  aliases: Record<string, F> = {},
): FormProblems<F> {
  const fields: Partial<Record<F, string>> = {};
  const general: string[] = [];
  const problems: FieldProblem[] = error instanceof ApiError ? (error.fields ?? []) : [];
  for (const problem of problems) {
    const field =
      aliases[problem.field] ??
      formFields.find((candidate) => candidate === problem.field) ??
      undefined;
    const message = problem.messages.join(' ');
    if (field) fields[field] = fields[field] ? `${fields[field]} ${message}` : message;
    else general.push(message);
  }
  const matched = Object.keys(fields).length > 0;
  if (!matched || general.length > 0) {
    const message = error instanceof Error ? error.message : 'Something unexpected happened.';
    // A 400 whose fields all landed on the form needs no second, vaguer line above them.
    general.unshift(message);
  }
  return { fields, general: [...new Set(general)] };
}

/**
 * The message to show under each field: the browser's own check once the person has tried to
 * submit, otherwise (or when that passes) the server's word from the last attempt.
 */
export function shownProblems<F extends string>(
  local: Partial<Record<F, string>>,
  server: Partial<Record<F, string>>,
  submitted: boolean,
): Partial<Record<F, string>> {
  const shown: Partial<Record<F, string>> = { ...server };
  if (submitted) {
    for (const [field, message] of Object.entries(local) as Array<[F, string | undefined]>) {
      if (message) shown[field] = message;
    }
  }
  return shown;
}
