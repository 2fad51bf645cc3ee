import { formulaNumber, formulaTerm } from './formula-number';

describe('formulaNumber', () => {
  it.each([
    [1701773.4049410962, '1702000'],
    [-1.4290034800152, '−1.429'],
    [4.740166883210224, '4.74'],
    [-0.0032746888722612793, '−0.003275'],
    [0, '0'],
    [2, '2'],
    [0.0000123456, '1.235×10^−5'],
    [-3.2e12, '−3.2×10^12'],
  ])('writes %p as %p', (value, text) => {
    expect(formulaNumber(value)).toBe(text);
  });

  it('keeps more digits when asked', () => {
    expect(formulaNumber(1701773.4049410962, 5)).toBe('1701800');
  });
});

describe('formulaTerm', () => {
  it('writes a negative term with a spaced true minus and a positive one with a plus', () => {
    expect(formulaTerm(-0.0032746888722612793)).toBe('− 0.003275');
    expect(formulaTerm(0.5)).toBe('+ 0.5');
  });
});
