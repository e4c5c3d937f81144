import { BadRequestException, Param, ParseIntPipe } from '@nestjs/common';

/** A whole-number route parameter; anything else is a 400 that names the parameter. */
export const IdParam = (name = 'id') =>
  Param(
    name,
    new ParseIntPipe({
      exceptionFactory: () =>
        new BadRequestException({
          message: `Invalid input: ${name}`,
          fields: [{ field: name, messages: [`${name} must be a whole number`] }],
        }),
    }),
  );
