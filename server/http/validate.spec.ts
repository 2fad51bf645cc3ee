import { z } from 'zod';
import { HttpError } from './http-error';
import { validate } from './validate';

const schema = z.strictObject({
  title: z.string().trim().min(1, 'Give the schedule a title'),
  fitId: z.uuid({ error: 'Choose a finished fit' }),
});

function refusal(input: unknown, where?: string): HttpError {
  try {
    validate(where ? z.uuid() : schema, input, where);
  } catch (error) {
    if (error instanceof HttpError) return error;
    throw error;
  }
  throw new Error('validate accepted the input');
}

describe('validate', () => {
  it('answers a bad field with its own message alone, as a sentence', () => {
    const error = refusal({ title: ' ', fitId: '6f1c2c8e-8e1a-4c39-9d7e-2f4b9c1d0a11' });
    expect(error.status).toBe(400);
    expect(error.message).toBe('Give the schedule a title.');
    expect(error.issues).toEqual([{ path: 'title', message: 'Give the schedule a title' }]);
  });

  it('joins the messages of several bad fields, naming no body or path', () => {
    const error = refusal({ title: '', fitId: 'x' });
    expect(error.message).toBe('Give the schedule a title. Choose a finished fit.');
    expect(error.message).not.toMatch(/body|—/);
  });

  it('names a bad value of the address by what it is', () => {
    expect(refusal('not-an-id', 'version id').message).toBe('The version id is not valid.');
  });
});
