import { ApiError } from '@/lib/api-client';

export interface ServerProblems {
  /** Messages for the form's own fields, by form name. */
  fields: Array<{ name: string; message: string }>;
  /** Everything else, in words. */
  general: string[];
}

/**
 * Sorts a refused write's `fields` into the form's boxes and the rest. The server names a figure
 * by its path in the request ('values.panels.closing', 'values.blankets.given.0.count').
 */
export function serverProblems(
  error: unknown,
  isFormName: (name: string) => boolean,
): ServerProblems {
  if (!(error instanceof ApiError)) {
    return {
      fields: [],
      general: [error instanceof Error ? error.message : 'Something went wrong.'],
    };
  }
  const fields: ServerProblems['fields'] = [];
  const general: string[] = [];
  for (const problem of error.fields ?? []) {
    const name = problem.field.replace(/^values\./, '');
    const message = problem.messages.join(' ');
    if (isFormName(name)) fields.push({ name, message });
    else general.push(message);
  }
  if (fields.length === 0 || general.length > 0) general.unshift(error.message);
  return { fields, general: [...new Set(general)] };
}
