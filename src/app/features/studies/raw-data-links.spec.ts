import { rawDataQuerySchema } from '@shared/raw-data/raw-data-request';
import { rawDataLinks, type RawDataChoices } from './raw-data-links';

const studyId = '5a0c1f44-2f7e-4c1b-9d43-2b1c5d1e7a10';
const everything: RawDataChoices = {
  format: 'csv',
  states: ['received', 'flagged', 'accepted', 'returned', 'rejected'],
  from: '',
  to: '',
  flagged: 'include',
};

/** The query of a link, read back the way the server reads it. */
function serverReading(link: string) {
  const url = new URL(link, 'http://localhost');
  return {
    path: url.pathname,
    query: rawDataQuerySchema.parse(Object.fromEntries(url.searchParams)),
  };
}

describe('rawDataLinks', () => {
  it('asks for the chosen format, states and days, and the dictionary for the same rows', () => {
    const links = rawDataLinks(studyId, {
      ...everything,
      format: 'xlsx',
      states: ['accepted', 'flagged'],
      from: '2026-03-01',
      to: '2026-03-31',
      flagged: 'exclude',
    });
    if (!links.ok) throw new Error(links.problem);
    const file = serverReading(links.file);
    expect(file.path).toBe(`/api/studies/${studyId}/raw-data/interviews.xlsx`);
    expect(file.query).toEqual({
      filter: { from: '2026-03-01', to: '2026-03-31', flagged: 'exclude' },
      states: ['accepted', 'flagged'],
    });
    const dictionary = serverReading(links.dictionary);
    expect(dictionary.path).toBe(`/api/studies/${studyId}/raw-data/dictionary.json`);
    expect(dictionary.query).toEqual(file.query);
  });

  it('leaves out empty days', () => {
    const links = rawDataLinks(studyId, everything);
    if (!links.ok) throw new Error(links.problem);
    expect(serverReading(links.file).query.filter).toEqual({ flagged: 'include' });
    expect(serverReading(links.file).path).toMatch(/interviews\.csv$/);
  });

  it('offers no link when no review state is chosen', () => {
    expect(rawDataLinks(studyId, { ...everything, states: [] })).toEqual({
      ok: false,
      problem: 'Choose at least one review state',
    });
  });

  it('offers no link when the first day comes after the last', () => {
    expect(rawDataLinks(studyId, { ...everything, from: '2026-04-02', to: '2026-04-01' })).toEqual({
      ok: false,
      problem: 'The first day must not be after the last day',
    });
  });
});
