import { HttpError } from '../http/http-error';
import { isFrozenVersionError, refusingFrozenVersions } from './frozen-version-error';

const triggerError = Object.assign(
  new Error('questionnaire version 3f… is published and cannot be changed'),
  { code: '23514' },
);
const wrapped = Object.assign(new Error('Failed query: update "questionnaire_versions" …'), {
  cause: triggerError,
});

describe('the frozen-version guard', () => {
  it('recognises the trigger’s refusal, also when wrapped by the query builder', () => {
    expect(isFrozenVersionError(triggerError)).toBe(true);
    expect(isFrozenVersionError(wrapped)).toBe(true);
  });

  it('leaves other check violations and other errors alone', () => {
    const otherCheck = Object.assign(new Error('violates check constraint "studies_price_range"'), {
      code: '23514',
    });
    expect(isFrozenVersionError(otherCheck)).toBe(false);
    expect(isFrozenVersionError(new Error('connection lost'))).toBe(false);
    expect(isFrozenVersionError(undefined)).toBe(false);
  });

  it('turns the refusal into 409 version-published and passes other errors through', async () => {
    const refused = refusingFrozenVersions(2, () => Promise.reject(wrapped));
    await expect(refused).rejects.toBeInstanceOf(HttpError);
    await expect(refused).rejects.toMatchObject({ status: 409, code: 'version-published' });
    const other = new Error('connection lost');
    await expect(refusingFrozenVersions(2, () => Promise.reject(other))).rejects.toBe(other);
    await expect(refusingFrozenVersions(2, () => Promise.resolve('saved'))).resolves.toBe('saved');
  });
});
