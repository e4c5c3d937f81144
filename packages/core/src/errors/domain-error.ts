/**
 * Thrown when a domain function gets an argument it cannot work with. It extends RangeError so
 * callers that only know the built-in errors still catch it, and it names the argument so the API
 * can map it to a field problem.
 */
export class DomainError extends RangeError {
  readonly argument: string;

  constructor(argument: string, message: string) {
    super(message);
    this.name = 'DomainError';
    this.argument = argument;
  }
}
