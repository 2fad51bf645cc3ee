import { problemFieldLabel, serverIssueWhere } from './problem-field';

describe('problemFieldLabel', () => {
  it.each([
    ['prompt', 'Question read out'],
    ['id', 'Block id'],
    ['pricesMinor.1', 'Price 2'],
    ['pricesMinor', 'Prices'],
    ['amountsMinor.0', 'Amount 1'],
    ['maxMinor', 'Highest amount'],
    ['maxPriceMinor', 'Highest price accepted'],
    ['bidDesign.levels.0.afterYesMinor', 'Bid 1, after a yes (higher)'],
    ['bidDesign.levels.2.bidMinor', 'Bid 3'],
    ['bands.1.toMinor', 'Band 2, up to'],
    ['options.2.value', 'Option 3, stored as'],
    ['showIf.blockId', 'Earlier block'],
    ['showIf', 'Ask only if an earlier answer…'],
  ])('names %s as the editor labels it: "%s"', (path, label) => {
    expect(problemFieldLabel(path)).toBe(label);
  });

  it('names nothing for a problem with the block as a whole', () => {
    expect(problemFieldLabel('')).toBe('');
    expect(problemFieldLabel('kind', 'consent')).toBe('');
  });

  it('uses the label of the panel of the block’s kind where it differs', () => {
    expect(problemFieldLabel('periodDays', 'purchase-recall')).toBe('Period remembered');
    expect(problemFieldLabel('periodDays', 'shelf-observation')).toBe('Period');
    expect(problemFieldLabel('maxPriceMinor', 'shelf-observation')).toBe(
      'Highest shelf price an enumerator may record',
    );
    expect(problemFieldLabel('maxPriceMinor', 'price-thresholds')).toBe('Highest price accepted');
  });

  it('falls back to the nearest labelled field, then to words, never to a raw key', () => {
    expect(problemFieldLabel('bidDesign.levels.1.extra')).toBe('Bid 2');
    expect(problemFieldLabel('somethingNewMinor')).toBe('Something new');
  });
});

describe('serverIssueWhere', () => {
  const kinds = ['consent', 'price-ladder'];
  const kindAt = (index: number) => kinds[index];

  it('names the block and the field of a refused definition', () => {
    expect(serverIssueWhere('definition.blocks.1.pricesMinor.2', kindAt)).toBe('Block 2 · Price 3');
    expect(serverIssueWhere('definition.blocks.0.kind', kindAt)).toBe('Block 1');
  });

  it('names the questionnaire for an issue outside every block', () => {
    expect(serverIssueWhere('definition.blocks', kindAt)).toBe('Questionnaire');
    expect(serverIssueWhere('definition', kindAt)).toBe('Questionnaire');
  });
});
