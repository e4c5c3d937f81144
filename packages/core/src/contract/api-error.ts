/** The one error body every API failure uses, so the web app can show field messages and a request id. */

export interface FieldProblem {
  /** Dotted path of the offending field, e.g. "regionId" or "sender.email". */
  field: string;
  messages: string[];
}

export interface ApiErrorBody {
  statusCode: number;
  error: string;
  message: string;
  fields?: FieldProblem[];
  requestId?: string;
  path?: string;
}
