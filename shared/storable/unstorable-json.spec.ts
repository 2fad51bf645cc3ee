import { maxStorableJsonDepth, unstorableJsonProblems } from './unstorable-json';

describe('unstorableJsonProblems', () => {
  it('finds nothing in ordinary answers', () => {
    expect(unstorableJsonProblems({ q1: { value: 'ok 🍞', list: [1, 'two', null] } })).toEqual([]);
  });

  it('names the path of each bad string, in arrays and objects alike', () => {
    const answers = { notes: { value: 'a\u0000b' }, brands: ['fine', '\ud83c'] };
    expect(unstorableJsonProblems(answers).map((problem) => problem.path)).toEqual([
      ['notes', 'value'],
      ['brands', 1],
    ]);
  });

  it('refuses a key the database cannot store', () => {
    const [problem] = unstorableJsonProblems({ outer: { 'k\u0000': 1 } });
    expect(problem?.path).toEqual(['outer']);
    expect(problem?.message).toMatch(/key/);
  });

  it('stops at a depth no answer needs, without running out of stack', () => {
    let deep: unknown = 'leaf';
    for (let i = 0; i < 100_000; i += 1) deep = [deep];
    const problems = unstorableJsonProblems(deep);
    expect(problems).toHaveLength(1);
    expect(problems[0]?.path).toHaveLength(maxStorableJsonDepth);
  });
});
