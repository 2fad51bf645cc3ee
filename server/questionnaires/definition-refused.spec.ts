import { definitionRefused } from './definition-refused';

describe('definitionRefused', () => {
  it('answers 400 with each problem at its place in the request body', () => {
    const error = definitionRefused(
      [
        {
          blockIndex: null,
          blockId: null,
          path: 'blocks',
          message: 'The questionnaire must start with a consent block',
        },
        {
          blockIndex: 2,
          blockId: 'ladder',
          path: 'pricesMinor.1',
          message: 'Price 2 (100) must be higher than price 1 (200)',
        },
        { blockIndex: 3, blockId: 'bid', path: '', message: 'Only one consent block is allowed' },
      ],
      'definition',
    );
    expect(error).toMatchObject({
      status: 400,
      code: 'invalid-questionnaire',
      message: 'The questionnaire is not valid: 3 problems to fix.',
    });
    expect(error.issues).toEqual([
      { path: 'definition.blocks', message: 'The questionnaire must start with a consent block' },
      {
        path: 'definition.blocks.2.pricesMinor.1',
        message: 'Price 2 (100) must be higher than price 1 (200)',
      },
      { path: 'definition.blocks.3', message: 'Only one consent block is allowed' },
    ]);
  });
});
