import { interviewReferenceSchema } from './review-queue';
import { referenceIdRange } from './reference-id-range';

describe('referenceIdRange', () => {
  it('spans every id that starts with the quoted digits', () => {
    expect(referenceIdRange('3f9a0c12')).toEqual({
      lowest: '3f9a0c12-0000-0000-0000-000000000000',
      highest: '3f9a0c12-ffff-ffff-ffff-ffffffffffff',
    });
  });

  it('crosses the dashes when more digits are quoted', () => {
    expect(referenceIdRange('3f9a0c12ab')).toEqual({
      lowest: '3f9a0c12-ab00-0000-0000-000000000000',
      highest: '3f9a0c12-abff-ffff-ffff-ffffffffffff',
    });
  });
});

describe('interviewReferenceSchema', () => {
  it('reads a reference as the review screens print it', () => {
    expect(interviewReferenceSchema.parse(' Interview 3F9A0C12 ')).toBe('3f9a0c12');
    expect(interviewReferenceSchema.parse('3f9a0c12-ab')).toBe('3f9a0c12ab');
  });

  it('refuses too short or non-hex text', () => {
    expect(interviewReferenceSchema.safeParse('3f9').success).toBe(false);
    expect(interviewReferenceSchema.safeParse('zz99aa').success).toBe(false);
  });
});
