import type { ValidationError } from '@nestjs/common';
import { toFieldProblems } from './validation.pipe';

describe('toFieldProblems', () => {
  it('names nested fields by their dotted path', () => {
    const errors: ValidationError[] = [
      {
        property: 'receivedOn',
        constraints: { isDateString: 'receivedOn must be a date' },
        children: [],
      },
      {
        property: 'sender',
        children: [
          {
            property: 'email',
            constraints: { isEmail: 'email must be an e-mail address' },
            children: [],
          },
        ],
      },
    ];
    expect(toFieldProblems(errors)).toEqual([
      { field: 'receivedOn', messages: ['receivedOn must be a date'] },
      { field: 'sender.email', messages: ['email must be an e-mail address'] },
    ]);
  });
});
