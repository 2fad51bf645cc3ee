import fc from 'fast-check';

const emoji = '🍞';

/** Text PostgreSQL, parsers or screens trip over. */
export const hostileText = fc.oneof(
  fc.constantFrom(
    '\u0000',
    'kiosk\u0000',
    emoji[0],
    `${emoji[1]}bread`,
    '\u202eevil\u202c',
    '\u200f\u200e',
    'line\nbreak\r\n',
    'x'.repeat(100_000),
    '',
    '   ',
    '0000-01-01T00:00:00Z',
    '0001-01-01T00:30:00+01:00',
    '9999-12-31T23:59:59-05:00',
    '+275760-09-13T00:00:00Z',
    '0000-01-01',
    '2027-02-30',
    '%E0%A4%A',
    '__proto__',
    '../../etc',
    '<script>alert(1)</script>',
  ),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 40 }),
);

/** Numbers at and beyond every edge JSON can carry. */
export const hostileNumber = fc.oneof(
  fc.constantFrom(
    0,
    -1,
    -0,
    0.5,
    2 ** 31,
    2 ** 53 + 2,
    -(2 ** 63),
    1e21,
    1e308,
    -1e308,
    Number.MIN_VALUE,
  ),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
);

/** Any JSON value with hostile leaves, keys that name prototypes, and some nesting. */
export const hostileValue: fc.Arbitrary<unknown> = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    hostileText,
    hostileNumber,
    fc.boolean(),
    fc.constant(null),
    fc.array(tie('value'), { maxLength: 4 }),
    fc.dictionary(
      fc.oneof(hostileText, fc.constantFrom('__proto__', 'constructor', 'prototype')),
      tie('value'),
      { maxKeys: 4 },
    ),
  ),
})).value;

/** Raw JSON texts a JSON.stringify of a plain value never produces. */
export const hostileJsonText = fc.constantFrom(
  '{',
  '{"a":',
  'null',
  '[]',
  '"text"',
  '12',
  '{"n":1e999999}',
  '{"__proto__":{"admin":true}}',
  '{"constructor":{"prototype":{"admin":true}}}',
  `${'['.repeat(50_000)}${']'.repeat(50_000)}`,
  `{"a":${'{"a":'.repeat(5_000)}1${'}'.repeat(5_000)}}`,
  '{"\\ud800":1}',
  '{"name":"\\u0000"}',
);
