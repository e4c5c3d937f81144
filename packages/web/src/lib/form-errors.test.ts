import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { formProblems } from './form-errors';

const invalid = (fields: Array<{ field: string; messages: string[] }>) =>
  new ApiError({ statusCode: 400, error: 'Bad Request', message: 'Check the form.', fields });

describe('sorting server problems onto a form', () => {
  it('puts each field message beside its field, with no second line above', () => {
    const problems = formProblems(
      invalid([{ field: 'email', messages: ['Someone already uses this address.'] }]),
      ['email', 'displayName'],
    );
    expect(problems).toEqual({
      fields: { email: 'Someone already uses this address.' },
      general: [],
    });
  });

  it('keeps what belongs to no field of the form, with the general message', () => {
    const problems = formProblems(
      invalid([
        { field: 'email', messages: ['Not an address.'] },
        { field: 'tenant', messages: ['Unknown.'] },
      ]),
      ['email'],
    );
    expect(problems.fields).toEqual({ email: 'Not an address.' });
    expect(problems.general).toEqual(['Check the form.', 'Unknown.']);
  });

  it('gives a refusal without fields as one general message', () => {
    const refusal = new ApiError({ statusCode: 403, error: 'Forbidden', message: 'Not yours.' });
    expect(formProblems(refusal, ['email'])).toEqual({ fields: {}, general: ['Not yours.'] });
  });
});
