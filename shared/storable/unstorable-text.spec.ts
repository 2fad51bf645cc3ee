import { unstorableTextReason } from './unstorable-text';

describe('unstorableTextReason', () => {
  it('passes ordinary text, whole emoji and right-to-left marks', () => {
    expect(unstorableTextReason('Mama Njeri’s kiosk 🍞 \u200f')).toBeNull();
  });

  it('refuses a NUL character', () => {
    expect(unstorableTextReason('bread\u0000')).toMatch(/NUL/);
  });

  it('refuses half of a surrogate pair, high or low, anywhere', () => {
    const emoji = '🍞';
    expect(unstorableTextReason(`loaf ${emoji[0]}`)).toMatch(/broken character/);
    expect(unstorableTextReason(`${emoji[1]} loaf`)).toMatch(/broken character/);
    expect(unstorableTextReason(`${emoji[0]}x${emoji[1]}`)).toMatch(/broken character/);
  });
});
