import { choiceOptionSchema, optionValueSchema } from './choice-option';

describe('choice options', () => {
  it('wants a stored value of lower-case letters, digits, - or _', () => {
    expect(choiceOptionSchema.safeParse({ value: 'tap_water', label: 'Tap water' }).success).toBe(
      true,
    );
    expect(choiceOptionSchema.safeParse({ value: 'Tap water', label: 'Tap water' }).success).toBe(
      false,
    );
    expect(
      choiceOptionSchema.safeParse({ value: 'tap', label: ' ' }).error?.issues[0].message,
    ).toBe('Give the option a label');
  });

  it('accepts only listed values', () => {
    const schema = optionValueSchema([
      { value: 'a', label: 'A' },
      { value: 'b', label: 'B' },
    ]);
    expect(schema.safeParse('b').success).toBe(true);
    expect(schema.safeParse('c').error?.issues[0].message).toBe('Choose one of: a, b');
  });
});
