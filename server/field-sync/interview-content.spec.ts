import { canonicalJson, contentFingerprint, type InterviewContent } from './interview-content';

const photo = (photoId: string) => ({
  photoId,
  sha256: 'a'.repeat(64),
  byteSize: 10,
  contentType: 'image/jpeg' as const,
});
const content: InterviewContent = {
  studyId: 's',
  questionnaireVersionId: 'v',
  routeId: 'r',
  pointId: 'p',
  startedAt: 1,
  finishedAt: 2,
  answers: { b: { steps: [1, 2] }, a: { agreed: true } },
  fix: null,
  respondentKey: null,
  photos: [photo('2'), photo('1')],
};

describe('canonicalJson', () => {
  it('sorts keys at every level and keeps array order', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, 1], c: null } })).toBe(
      '{"a":{"c":null,"d":[3,1]},"b":1}',
    );
  });

  it('leaves out undefined members, as JSON does', () => {
    expect(canonicalJson({ a: undefined, b: 2 })).toBe('{"b":2}');
  });
});

describe('contentFingerprint', () => {
  it('is the same whatever the order of keys and photos', () => {
    const reordered = {
      ...content,
      answers: { a: { agreed: true }, b: { steps: [1, 2] } },
      photos: [photo('1'), photo('2')],
    };
    expect(contentFingerprint(reordered)).toBe(contentFingerprint(content));
  });

  it('differs when an answer differs', () => {
    const changed = { ...content, answers: { a: { agreed: true }, b: { steps: [2, 1] } } };
    expect(contentFingerprint(changed)).not.toBe(contentFingerprint(content));
  });
});
