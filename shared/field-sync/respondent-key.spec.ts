import { createHash } from 'node:crypto';
import { fieldInterviewSchema } from './field-interview';
import {
  normaliseRespondentReference,
  respondentKeyFor,
  respondentReferenceProblem,
} from './respondent-key';

const studyId = '5b0c7a52-4d7e-4b7a-9c1e-2f3a4b5c6d70';
const otherStudyId = '9a4b1c2d-3e4f-4a5b-8c6d-7e8f9a0b1c2d';

/** A second implementation: Node's own SHA-256 with its base64url encoder. */
const nodeKey = (study: string, normalised: string) =>
  createHash('sha256').update(`${study}:${normalised}`, 'utf8').digest('base64url');

describe('normaliseRespondentReference', () => {
  it.each([
    ['  +254 712-345 678 ', '254712345678'],
    ['254712345678', '254712345678'],
    ['(0712) 345.678', '0712345678'],
    ['HH–0042', 'hh0042'], // an en dash, as phone keyboards substitute for a hyphen
    ['Stall [B] {7}', 'stallb7'],
    ['\u00a0kiosk\t9 ', 'kiosk9'], // no-break space and a tab
    ['ＳＴＡＬＬ　７', 'stall7'], // full-width letters, digit and space
    ['A/12', 'a/12'], // a slash may mean something in a code: kept
    ['KIOSK', 'kiosk'], // lower-cased the same on every phone, whatever its language
  ])('turns %j into %j', (typed, normalised) => {
    expect(normaliseRespondentReference(typed)).toBe(normalised);
  });

  it('keeps a local phone number apart from its international form', () => {
    expect(normaliseRespondentReference('0712 345 678')).not.toBe(
      normaliseRespondentReference('+254 712 345 678'),
    );
  });
});

describe('respondentReferenceProblem', () => {
  it('accepts an empty reference (none given) and one of four characters or more', () => {
    expect(respondentReferenceProblem('')).toBeNull();
    expect(respondentReferenceProblem(' - ')).toBeNull();
    expect(respondentReferenceProblem('H-042')).toBeNull();
  });

  it('refuses fewer than four letters or digits, naming the field', () => {
    expect(respondentReferenceProblem('B 7')).toBe(
      'Respondent reference: type at least 4 letters or digits, or leave it empty',
    );
  });

  it('refuses more than 64 characters, naming the field', () => {
    expect(respondentReferenceProblem('7'.repeat(65))).toBe(
      'Respondent reference: keep it under 64 characters',
    );
  });
});

describe('respondentKeyFor', () => {
  it('hashes study and reference to the digest another SHA-256 gives', async () => {
    // Computed with Node's crypto.createHash('sha256') (base64url) and, separately, with
    // `printf … | openssl dgst -sha256 -binary | basenc --base64url` (padding removed).
    expect(await respondentKeyFor(studyId, '+254 712 345 678')).toBe(
      '76u6MifHS-JlJ3XZqpv4eqjw7nbM4qlkekumQi98GpE',
    );
  });

  it.each(['HH-0042', 'Ｓｔａｌｌ ７', 'kiosk-9 (north gate)', '0712.345.678'])(
    'agrees with Node’s SHA-256 of the normalised %j',
    async (typed) => {
      expect(await respondentKeyFor(studyId, typed)).toBe(
        nodeKey(studyId, normaliseRespondentReference(typed)),
      );
    },
  );

  it('gives the same key however the same reference is typed', async () => {
    expect(await respondentKeyFor(studyId, '254-712-345-678')).toBe(
      await respondentKeyFor(studyId, '+254 (712) 345 678'),
    );
  });

  it('gives another study a different key for the same reference', async () => {
    expect(await respondentKeyFor(otherStudyId, '+254 712 345 678')).not.toBe(
      await respondentKeyFor(studyId, '+254 712 345 678'),
    );
  });

  it('makes a 43-character key the sync schema accepts', async () => {
    const key = await respondentKeyFor(studyId, 'HH-0042');
    expect(key).toHaveLength(43);
    const interview = {
      id: '0f1e2d3c-4b5a-4968-8776-655443322110',
      studyId,
      questionnaireVersionId: studyId,
      routeId: studyId,
      pointId: studyId,
      startedAt: '2027-03-01T09:00:00Z',
      finishedAt: '2027-03-01T09:10:00Z',
      answers: {},
      photos: [],
      respondentKey: key,
    };
    expect(fieldInterviewSchema.safeParse(interview).success).toBe(true);
  });

  it('refuses to make a key of a reference too short to tell respondents apart', async () => {
    await expect(respondentKeyFor(studyId, 'B7')).rejects.toThrow('Respondent reference');
    await expect(respondentKeyFor(studyId, '  ')).rejects.toThrow('No respondent reference');
  });
});
