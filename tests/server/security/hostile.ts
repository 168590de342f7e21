import fc from 'fast-check';

/** Field names the API's bodies use: a mutation may set one the valid body left out. */
export const fieldNames = ['name', 'notes', 'label', 'kind', 'reference', 'customer', 'description', 'boothId', 'rackId', 'shelf', 'productId', 'partIds', 'lotId', 'mixId', 'lotIds', 'sprayerId', 'stepPosition', 'jobIds', 'finishSystemId', 'items', 'start', 'end', 'state', 'checklist', 'override', 'reason', 'quantity', 'email', 'role', 'units', 'timezone', 'steps', 'dryingTimes', 'openingHours', 'expiresOn', 'dueDate', 'sprayedAt', 'at', 'idempotencyKey', 'acknowledgements', 'hazards', 'notify', 'wantedL', 'tempC', 'horizonDays', 'sessions', 'shelves', 'dryingTempC', 'thinningPct', 'wetFilmUm'];

/** Keys that have polluted prototypes elsewhere, plus ones that look like privilege. */
export const hostileKeys = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'isAdmin', 'role', 'id', '$where', ''];

/** An object with own keys, even `__proto__`, so JSON.stringify writes them all as given. */
export function ownKeys(entries: [string, unknown][]): Record<string, unknown> {
  const target: Record<string, unknown> = {};
  for (const [key, value] of entries) Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
  return target;
}

const pollution = ownKeys([
  ['__proto__', { polluted: 'yes', isAdmin: true }],
  ['constructor', { prototype: { polluted: 'yes' } }],
]);

export const hostileString = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom('', ' ', '\u0000', 'a\u0000b', '\u202eevil\u202c', 'مرحبا بالعالم', '𝕳𝖊𝖑𝖑𝖔 🎨🖌️', "'; DROP TABLE users; --", '" OR 1=1 --', '<script>alert(1)</script>', '../../etc/passwd', '%00', '${7*7}', 'NaN', 'Infinity', '-1e308', '1e308', '1e999', '-0', 'null', 'true', '{}', '[]', '__proto__', '2027-02-30', '2027-13-01T25:61:00Z', '\r\n\r\n') },
  { weight: 3, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
  { weight: 1, arbitrary: fc.integer({ min: 20_000, max: 60_000 }).map((n) => 'é'.repeat(n)) },
  { weight: 1, arbitrary: fc.integer({ min: 80_000, max: 110_000 }).map((n) => 'x'.repeat(n)) },
);

export const hostileNumber = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(-1, 0, -0, 0.5, 1e308, -1e308, 5e-324, 2 ** 31 - 1, 2 ** 31, -(2 ** 31) - 1, 2 ** 53, Number.MAX_SAFE_INTEGER, -Number.MAX_SAFE_INTEGER, 1e21) },
  { weight: 1, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true }) },
  { weight: 1, arbitrary: fc.integer() },
);

/** Values a schema may well let through that the database or the maths may still choke on. */
export const plausibleNasty = fc.constantFrom<unknown>(
  'a\u0000b',
  '\u0000',
  '\u202emirrored\u202c',
  'Zoë 🎨 مرحبا',
  'x'.repeat(200),
  'x'.repeat(5000),
  2 ** 31 - 1,
  2 ** 31,
  -(2 ** 31) - 1,
  2 ** 53,
  1e308,
  -1,
  0,
  0.1,
  1,
  true,
  null,
  [],
  {},
  '2027-06-01T09:00:00+14:00',
  '0001-01-01T00:00:00Z',
  '9999-12-31T23:59:59Z',
);

const hostileScalar = fc.oneof(hostileString, hostileNumber, fc.boolean(), fc.constant(null));

/** Nested arrays or objects many levels deep. */
const deepNesting = fc.tuple(fc.integer({ min: 50, max: 2000 }), fc.boolean()).map(([depth, asArray]) => {
  let value: unknown = 'bottom';
  for (let i = 0; i < depth; i++) value = asArray ? [value] : { a: value };
  return value;
});

export const hostileValue: fc.Arbitrary<unknown> = fc.letrec<{ value: unknown }>((tie) => ({
  value: fc.oneof(
    { depthSize: 'small', withCrossShrink: true },
    { weight: 5, arbitrary: hostileScalar },
    { weight: 1, arbitrary: fc.array(tie('value'), { maxLength: 4 }) },
    { weight: 1, arbitrary: fc.array(fc.tuple(fc.oneof(fc.constantFrom(...hostileKeys), fc.string({ maxLength: 12 })), tie('value')), { maxLength: 4 }).map(ownKeys) },
    { weight: 1, arbitrary: fc.constant(pollution) },
    { weight: 1, arbitrary: deepNesting },
  ),
})).value;

/** A path segment a client should never send: negative, enormous, fractional, traversal, unicode, malformed escapes. */
export const hostileSegment = fc.oneof(
  {
    weight: 4,
    arbitrary: fc.constantFrom('-1', '0', '1.5', '1e3', '1e999', 'NaN', 'Infinity', '0x10', ' 7', '2147483648', '9007199254740993', '99999999999999999999999', '..', '..%2F..', '%2e%2e%2f%2e%2e', '%', '%E0%A4%A', '%00', '%C0%AF', '١٢٣', '½', '__proto__', 'constructor', encodeURIComponent('مرحبا'), encodeURIComponent('<script>')),
  },
  { weight: 2, arbitrary: fc.string({ unit: 'binary', minLength: 1, maxLength: 30 }).map(encodeURIComponent) },
  { weight: 1, arbitrary: fc.integer({ min: 500, max: 4000 }).map((n) => '9'.repeat(n)) },
);

/** A query string: hostile pagination and filters, repeated keys, bracket keys, malformed escapes. */
export const hostileQuery = fc.oneof(
  {
    weight: 2,
    arbitrary: fc.constantFrom('', 'page=-1&pageSize=1e999', 'page=0', 'pageSize=100000', 'page=1&page=2', '__proto__[polluted]=yes', 'constructor[prototype][polluted]=yes', 'from=yesterday&to=%00', 'q=%', 'q=%E0%A4%A', 'state[]=open', 'history=maybe', `q=${'z'.repeat(5000)}`),
  },
  {
    weight: 3,
    arbitrary: fc
      .array(fc.tuple(fc.oneof(fc.constantFrom('page', 'pageSize', 'q', 'from', 'to', 'boothId', 'jobId', 'state', 'method', 'transferEfficiencyPct', ...hostileKeys), fc.string({ maxLength: 10 })), fc.oneof(hostileString.filter((v) => v.length < 2000), hostileNumber.map(String))), { maxLength: 4 })
      .map((pairs) => pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&')),
  },
);

/** Content types and encodings a body parser may refuse. */
export const hostileHeaders = fc.constantFrom<Record<string, string>>(
  { 'content-type': 'application/json; charset=utf-7' },
  { 'content-type': 'application/json; charset=latin1' },
  { 'content-type': 'text/plain' },
  { 'content-type': 'application/x-www-form-urlencoded' },
  { 'content-type': 'multipart/form-data' },
  { 'content-type': 'multipart/form-data; boundary=zz' },
  { 'content-type': 'application/json', 'content-encoding': 'gzip' },
  { 'content-type': 'application/json', 'content-encoding': 'br, identity, x-unknown' },
);

/** Text that is not JSON, or only nearly. */
export const brokenJson = fc.constantFrom('{', '{"a":', 'not json', '{"a":1,}', "{'a':1}", '[1,2', '\u0000', '{"__proto__":', 'NaN', '1e999', '{"a":1}{"b":2}');
