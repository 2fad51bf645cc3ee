import { problemFieldLabel } from './problem-field';

describe('problemFieldLabel', () => {
  it.each([
    ['pricesMinor.1', 'price 2'],
    ['bidDesign.levels.0.afterYesMinor', 'bid design, level 1, after yes'],
    ['showIf.blockId', 'show if, block id'],
    ['options.2.value', 'option 3, value'],
    ['', ''],
  ])('writes %s as "%s"', (path, label) => {
    expect(problemFieldLabel(path)).toBe(label);
  });
});
