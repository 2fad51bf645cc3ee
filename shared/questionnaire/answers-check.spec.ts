import { mulberry32 } from '../estimation/random/mulberry32';
import type { InterviewAnswers } from './answer';
import { mutateAnswer } from './answer-mutation';
import { answerSamples } from './answer-samples';
import { answerSchemaFor } from './answer-schema';
import { prepareAnswersCheck } from './answers-check';
import type { Block } from './block';
import { blockKinds } from './block-kind';
import { isBlockShown } from './block-visibility';
import { validateInterviewAnswers } from './interview-answers';
import type { SkipCondition } from './skip-condition';
import { validateQuestionnaire } from './validate-questionnaire';

const samples = answerSamples();
const validOf = (id: string) => samples.find((sample) => sample.block.id === id)!.valid;

/** Conditions of every test, on earlier blocks, one on a block that is itself conditional. */
const conditions: Readonly<Record<string, SkipCondition>> = {
  size: { blockId: 'owns', test: 'equals', value: 'yes' },
  'uses-two': { blockId: 'uses', test: 'not-equals', value: 'third' },
  wtp: { blockId: 'size', test: 'greater', value: 2 },
  'recall-units': { blockId: 'count', test: 'less', value: 500 },
  'income-told': { blockId: 'bid', test: 'equals', value: 'yes' },
  remarks: { blockId: 'wtp', test: 'answered' },
};
const first = ['consent', 'owns', 'uses', 'count', 'bid', 'size', 'wtp'];
const ordered = [
  ...first.map((id) => samples.find((sample) => sample.block.id === id)!),
  ...samples.filter((sample) => !first.includes(sample.block.id)),
];
const definition = {
  blocks: ordered.map(({ block }): Block => {
    const showIf = conditions[block.id];
    return showIf ? { ...block, showIf } : block;
  }),
};
const { blocks } = definition;

// The full check, with schemas built once so thousands of interviews stay quick to check.
const schemas = new Map(blocks.map((block) => [block, answerSchemaFor(block)]));
const fullCheck = (answers: InterviewAnswers) =>
  validateInterviewAnswers(definition, answers, (block) => schemas.get(block)!);

const pick = <T>(list: readonly T[], random: () => number): T =>
  list[Math.floor(random() * list.length)];

/** An interview a careful enumerator could record: shown blocks answered, hidden ones not. */
function validInterview(random: () => number): Record<string, unknown> {
  const answers: Record<string, unknown> = {};
  for (const block of blocks) {
    if (!isBlockShown(block, answers, blocks)) continue;
    if (block.kind === 'consent') answers[block.id] = { agreed: true };
    else if (block.required || random() < 0.7) {
      answers[block.id] = structuredClone(pick(validOf(block.id), random));
    }
  }
  return answers;
}

/** The interview with one thing changed, the way devices and people get answers wrong. */
function spoilt(answers: Record<string, unknown>, random: () => number): Record<string, unknown> {
  const copy = { ...answers };
  const answered = Object.keys(copy);
  const block = pick(blocks, random);
  switch (Math.floor(random() * 6)) {
    case 0:
      copy[pick(answered, random)] = mutateAnswer(copy[pick(answered, random)], random);
      break;
    case 1:
      delete copy[pick(answered, random)];
      break;
    case 2:
      copy[block.id] = structuredClone(pick(validOf(block.id), random));
      break;
    case 3:
      copy[pick(['ghost', 'Owns', ''], random)] = { value: 'yes' };
      break;
    case 4:
      copy['consent'] = pick([{ agreed: false }, { agreed: 'yes' }, undefined, null], random);
      break;
    default:
      copy[block.id] = mutateAnswer(copy[block.id] ?? pick(validOf(block.id), random), random);
  }
  return copy;
}

describe('prepareAnswersCheck', () => {
  const check = prepareAnswersCheck(definition);

  it('is tried on a valid questionnaire with every kind of block and of condition', () => {
    expect(validateQuestionnaire(definition)).toEqual([]);
    expect(new Set(blocks.map((b) => b.kind))).toEqual(new Set(blockKinds));
    const tests = new Set(blocks.flatMap((b) => (b.showIf ? [b.showIf.test] : [])));
    expect(tests).toEqual(new Set(['equals', 'not-equals', 'less', 'greater', 'answered']));
  });

  it('passes valid interviews quickly, with no problem in the full check either', () => {
    const random = mulberry32(20270301);
    for (let n = 0; n < 1500; n++) {
      const answers = validInterview(random);
      expect(fullCheck(answers)).toEqual([]);
      expect(check.passes(answers)).toBe(true);
      expect(check.problems(answers)).toEqual([]);
    }
  });

  it('reports exactly the problems of the full check on spoilt interviews', () => {
    const random = mulberry32(1500);
    let withProblems = 0;
    let quickPasses = 0;
    for (let n = 0; n < 4000; n++) {
      let answers = validInterview(random);
      for (let step = 0; step <= n % 2; step++) answers = spoilt(answers, random);
      const expected = fullCheck(answers);
      expect(check.problems(answers)).toEqual(expected);
      if (check.passes(answers)) {
        quickPasses++;
        expect(expected).toEqual([]);
      }
      if (expected.length > 0) withProblems++;
    }
    // Both sides must be reached, or the agreement above proves little.
    expect(withProblems).toBeGreaterThan(2500);
    expect(quickPasses).toBeGreaterThan(100);
  });

  it('words each kind of problem as the full check does', () => {
    const answers = {
      ...validInterview(mulberry32(7)),
      owns: { value: 'no' },
      size: { people: 4 },
      count: { value: 2.5 },
      ghost: {},
    };
    delete (answers as Record<string, unknown>)['ladder'];
    const problems = check.problems(answers);
    expect(problems).toEqual(fullCheck(answers));
    expect(problems.map((p) => `${p.blockId}${p.path ? `.${p.path}` : ''}: ${p.message}`)).toEqual(
      expect.arrayContaining([
        'ghost: No block has the id "ghost"',
        'size: This block was not to be asked, given the earlier answers',
        'count.value: Type a whole number',
        'ladder: This block needs an answer',
      ]),
    );
  });

  it('keeps no answer without consent, as the full check says', () => {
    const answers = { ...validInterview(mulberry32(11)), consent: { agreed: false } };
    expect(check.passes(answers)).toBe(false);
    expect(check.problems(answers)).toEqual(fullCheck(answers));
    expect(check.problems(answers)[0].message).toBe('Without consent, no answer may be kept');
  });
});
