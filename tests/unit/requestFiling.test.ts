import { describe, expect, it } from 'vitest';
import { requestFilingFields } from '../../shared/requests/filing';
import { validationError } from '../../server/http/errors';

const valid = { projectId: '0b6f3c8e-4a8e-4f3b-9a0e-5b1d2c3e4f5a', title: 'Move CJ-2 six feet', reason: 'Pump reach on the second placement.' };

describe('request filing schema (shared by the form and the server)', () => {
  it('accepts a complete filing and trims its text', () => {
    const parsed = requestFilingFields.parse({ ...valid, title: '  Move CJ-2 six feet  ' });
    expect(parsed.title).toBe('Move CJ-2 six feet');
  });

  it('names each missing or short field with a message a contractor understands', () => {
    const result = requestFilingFields.safeParse({ projectId: 'nope', title: 'abc' });
    expect(result.success).toBe(false);
    const error = validationError(result.error!);
    expect(error.status).toBe(400);
    expect(error.fields).toEqual({
      projectId: 'Choose the project this request is for.',
      title: 'The title needs at least 5 characters.',
      reason: 'Explain why the departure from the plans is needed.',
    });
  });

  it('refuses fields it does not know, so a client cannot set state or numbers itself', () => {
    const result = requestFilingFields.safeParse({ ...valid, state: 'closed', number: 'X-1' });
    expect(result.success).toBe(false);
    expect(validationError(result.error!).fields).toEqual({ state: 'This field is not accepted here.', number: 'This field is not accepted here.' });
  });

  it('refuses a title that is only spaces', () => {
    expect(requestFilingFields.safeParse({ ...valid, title: '        ' }).success).toBe(false);
  });
});
