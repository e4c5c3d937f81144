import { DomainError } from './domain-error';

// Argument guards shared by the domain functions. Each names the argument in its message
// ("grid.columns must be …") because the message may reach a person filling in a form.

function describe(value: unknown): string {
  return typeof value === 'number' ? String(value) : `${typeof value} ${JSON.stringify(value)}`;
}

export function requireWholeNumber(argument: string, value: number, minimum = 0): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < minimum) {
    throw new DomainError(
      argument,
      `${argument} must be a whole number of at least ${minimum}; got ${describe(value)}.`,
    );
  }
  return value;
}

export function requireFiniteNumber(argument: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new DomainError(argument, `${argument} must be a finite number; got ${describe(value)}.`);
  }
  return value;
}

export function requirePositiveNumber(argument: string, value: number): number {
  if (requireFiniteNumber(argument, value) <= 0) {
    throw new DomainError(argument, `${argument} must be greater than 0; got ${value}.`);
  }
  return value;
}

export function requireNonNegativeNumber(argument: string, value: number): number {
  if (requireFiniteNumber(argument, value) < 0) {
    throw new DomainError(argument, `${argument} must be 0 or more; got ${value}.`);
  }
  return value;
}
