import { BadRequestException, ValidationPipe, type ValidationError } from '@nestjs/common';
import type { FieldProblem } from '@tallyloom/core';

/** Flattens class-validator's nested errors into `field.path: messages`. */
export function toFieldProblems(errors: ValidationError[], parent = ''): FieldProblem[] {
  return errors.flatMap((error) => {
    const field = parent ? `${parent}.${error.property}` : error.property;
    const own: FieldProblem[] = error.constraints
      ? [{ field, messages: Object.values(error.constraints) }]
      : [];
    return [...own, ...toFieldProblems(error.children ?? [], field)];
  });
}

/** The global pipe: unknown fields rejected, types converted, every problem named by its field. */
export function createValidationPipe(): ValidationPipe {
  return new ValidationPipe({
    whitelist: true,
    forbidNonWhitelisted: true,
    transform: true,
    // One message per field: the first rule it breaks.
    stopAtFirstError: true,
    exceptionFactory: (errors) => {
      const fields = toFieldProblems(errors);
      const names = [...new Set(fields.map((f) => f.field))].join(', ');
      return new BadRequestException({ message: `Invalid input: ${names}`, fields });
    },
  });
}
