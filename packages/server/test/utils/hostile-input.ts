import { gzipSync } from 'node:zlib';
import fc from 'fast-check';

/**
 * Hostile input for the fuzz tests (fast-check arbitraries and fixed lists). The short run of
 * `npm test` uses a fixed seed and a few runs per route; set TACET_FUZZ_RUNS (runs per property)
 * and TACET_FUZZ_SEED for a longer or different run. fast-check prints the seed and the shrunk
 * counterexample of a failure; rerun with that seed to reproduce it.
 */
const envInt = (name: string, fallback: number): number => {
  const value = Number(process.env[name]);
  return Number.isInteger(value) && value > 0 ? value : fallback;
};

export const FUZZ_RUNS = envInt('TACET_FUZZ_RUNS', 10);
export const FUZZ_SEED = envInt('TACET_FUZZ_SEED', 20_260_801);

/** fast-check parameters: the fixed seed and `FUZZ_RUNS × factor` runs (at least 1). */
export const fuzzParameters = (factor = 1): { seed: number; numRuns: number } => ({
  seed: FUZZ_SEED,
  numRuns: Math.max(1, Math.round(FUZZ_RUNS * factor)),
});

/** A jest timeout for a test doing `requests` fuzz requests (generous: the machine is shared). */
export const fuzzTimeout = (requests: number): number => 60_000 + requests * 1_000;

/** Spreadsheet formula payloads (OWASP "CSV injection"). */
export const FORMULA_PAYLOADS = [
  "=cmd|' /C calc'!A0",
  '=1+1',
  '+1+1',
  '-2+3',
  '@SUM(1,1)',
  '=HYPERLINK("http://example.invalid/x","open")',
  '\t=1',
  '\r=1',
] as const;

/** Unicode that breaks naive code: bidi controls, zero-width, joiners, emoji, combining marks, lone surrogates. */
export const UNICODE_SAMPLES = [
  'abc\u202eFDP.exe', // right-to-left override
  'שלום עולם', // right-to-left text
  'a\u200bb\u200c\u200d', // zero-width space, non-joiner, joiner
  '\ufeffBOM',
  '🚀 👩‍🔧 🏳️‍🌈',
  'e\u0301 Å Ω',
  '\ud800', // lone high surrogate
  'x\udfffy', // lone low surrogate
  'line\u2028separator',
  'nul\u0000byte',
  'bell\u0007',
  'İıß\u00a0',
] as const;

/** Numbers written as text, as a careless client or a spreadsheet would send them. */
export const NUMERIC_TEXT = [
  'NaN',
  'Infinity',
  '-Infinity',
  '1e309',
  '-1e309',
  '1e-400',
  '0x10',
  '1_000',
  '1,5',
  '1 000',
  '1.2.3',
  '+5',
  '-0',
  '.5',
  '5.',
  '１２',
  '٣',
  ' 12 ',
  '12abc',
  '',
] as const;

/** Numbers at the edges of doubles, safe integers and 32-bit columns. */
export const EDGE_NUMBERS = [
  1e308,
  -1e308,
  Number.MAX_VALUE,
  Number.MIN_VALUE,
  Number.MAX_SAFE_INTEGER + 2,
  -(Number.MAX_SAFE_INTEGER + 2),
  2 ** 31,
  2 ** 31 - 1,
  -(2 ** 31) - 1,
  2 ** 63,
  1e-320,
  -1,
  0,
  0.5,
] as const;

const INJECTION_TEXT = [
  "' OR '1'='1",
  '"; DROP TABLE "user"; --',
  '<script>alert(1)</script>',
  '../../../etc/passwd',
  '${7*7}{{7*7}}',
  '%s%s%n',
] as const;

/** Keys a request should never get to set: prototype pollution and fields that belong to the server. */
export const PROTOTYPE_KEYS = ['__proto__', 'constructor', 'prototype'] as const;
const TEMPTING_KEYS = [
  ...PROTOTYPE_KEYS,
  'toString',
  'hasOwnProperty',
  'id',
  'role',
  'ownerId',
  'authorId',
  'checkerId',
  'status',
  'passwordHash',
  'isAdmin',
  'createdAt',
] as const;

/** Long strings: 10 kB, 600 kB of two-byte characters, and one just over the 1 MB body limit. */
const LONG_STRINGS = ['x'.repeat(10_000), 'é'.repeat(300_000), 'x'.repeat(1024 * 1024 + 1)] as const;

/** Any 16-bit code unit, lone surrogates included. */
const codeUnitString = fc.string({ unit: fc.integer({ min: 0, max: 0xffff }).map((c) => String.fromCharCode(c)), maxLength: 30 });

export const hostileScalar: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom(...EDGE_NUMBERS),
  fc.constantFrom(...NUMERIC_TEXT),
  fc.constantFrom(...FORMULA_PAYLOADS),
  fc.constantFrom(...UNICODE_SAMPLES),
  fc.constantFrom(...INJECTION_TEXT),
  fc.constantFrom(...PROTOTYPE_KEYS),
  fc.constantFrom(null, true, false, '', 'true', 'null'),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
  codeUnitString,
  fc.constantFrom(...LONG_STRINGS),
);

export const hostileKey: fc.Arbitrary<string> = fc.oneof(fc.constantFrom(...TEMPTING_KEYS), fc.string({ maxLength: 12 }));

/** An object from entries, each key an own enumerable property (so `__proto__` is sent as a key). */
export function objectOf(entries: ReadonlyArray<readonly [string, unknown]>): Record<string, unknown> {
  const object: Record<string, unknown> = {};
  for (const [key, value] of entries) Object.defineProperty(object, key, { value, enumerable: true, writable: true, configurable: true });
  return object;
}

/** Any JSON value, mostly hostile scalars, sometimes small arrays and objects of them. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 5, arbitrary: hostileScalar },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
  { weight: 1, arbitrary: fc.array(hostileScalar, { maxLength: 4 }) },
  { weight: 1, arbitrary: fc.array(fc.tuple(hostileKey, hostileScalar), { maxLength: 4 }).map(objectOf) },
);

type Path = ReadonlyArray<string | number>;

/** A deep copy of JSON data (JSON.parse keeps `__proto__` as an own key). */
const copy = <T>(value: T): T => (value === undefined ? value : JSON.parse(JSON.stringify(value)));

const isContainer = (value: unknown): value is Record<string | number, unknown> => typeof value === 'object' && value !== null;

/** Every path in a JSON value (the root is `[]`), and the paths of its objects. */
function pathsOf(value: unknown, path: Path = [], all: Path[] = [], objects: Path[] = []): { all: Path[]; objects: Path[] } {
  all.push(path);
  if (Array.isArray(value)) value.forEach((item, index) => pathsOf(item, [...path, index], all, objects));
  else if (isContainer(value)) {
    objects.push(path);
    for (const key of Object.keys(value)) pathsOf(value[key], [...path, key], all, objects);
  }
  return { all, objects };
}

/** The container at `path` in `root`, or undefined when an earlier change removed it. */
function containerAt(root: unknown, path: Path): Record<string | number, unknown> | undefined {
  let node = root;
  for (const key of path) {
    if (!isContainer(node)) return undefined;
    node = node[key];
  }
  return isContainer(node) ? node : undefined;
}

type Change = (body: unknown) => unknown;

const replaceAt =
  (path: Path, value: unknown): Change =>
  (body) => {
    if (path.length === 0) return value;
    const parent = containerAt(body, path.slice(0, -1));
    if (parent) Object.defineProperty(parent, path[path.length - 1], { value, enumerable: true, writable: true, configurable: true });
    return body;
  };

const removeAt =
  (path: Path): Change =>
  (body) => {
    const parent = containerAt(body, path.slice(0, -1));
    const key = path[path.length - 1];
    if (Array.isArray(parent)) parent.splice(Number(key), 1);
    else if (parent) delete parent[key];
    return body;
  };

const addAt =
  (path: Path, key: string, value: unknown): Change =>
  (body) => {
    const target = containerAt(body, path);
    if (target && !Array.isArray(target))
      Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
    return body;
  };

/**
 * Mutations of a valid example body: one to three changes (a value replaced by a hostile one,
 * a field removed, an unexpected or prototype-polluting field added), or the whole body
 * replaced by a hostile value.
 */
export function mutationsOf(seed: unknown): fc.Arbitrary<unknown> {
  const { all, objects } = pathsOf(seed);
  const inner = all.filter((path) => path.length > 0);
  const changes: Array<fc.Arbitrary<Change>> = [
    fc.record({ path: fc.constantFrom(...all), value: hostileValue }).map(({ path, value }) => replaceAt(path, value)),
  ];
  if (inner.length > 0) changes.push(fc.constantFrom(...inner).map(removeAt));
  if (objects.length > 0) {
    changes.push(
      fc
        .record({ path: fc.constantFrom(...objects), key: hostileKey, value: hostileValue })
        .map(({ path, key, value }) => addAt(path, key, value)),
    );
  }
  return fc.oneof(
    {
      weight: 8,
      arbitrary: fc
        .array(fc.oneof(...changes), { minLength: 1, maxLength: 3 })
        .map((steps) => steps.reduce<unknown>((body, step) => step(body), copy(seed))),
    },
    { weight: 1, arbitrary: hostileValue },
  );
}

/** A raw request body with its content type (undefined: no Content-Type header). */
export interface RawBody {
  name: string;
  contentType?: string;
  contentEncoding?: string;
  body: string | Buffer;
}

const deepArrays = (depth: number) => `${'['.repeat(depth)}${']'.repeat(depth)}`;
const deepObjects = (depth: number) => `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`;

/** Bodies no JSON route should accept: malformed text, pathological shapes, wrong content types. */
export const RAW_BODIES: readonly RawBody[] = [
  { name: 'truncated JSON', contentType: 'application/json', body: '{"name": "x",' },
  { name: 'a trailing comma', contentType: 'application/json', body: '{"name": "x",}' },
  { name: 'single quotes', contentType: 'application/json', body: "{'name': 'x'}" },
  { name: 'a NaN literal', contentType: 'application/json', body: '{"value": NaN}' },
  { name: 'an Infinity literal', contentType: 'application/json', body: '{"value": -Infinity}' },
  { name: 'a number beyond a double (1e400)', contentType: 'application/json', body: '{"value": 1e400}' },
  { name: 'a JSON string', contentType: 'application/json', body: '"text"' },
  { name: 'JSON null', contentType: 'application/json', body: 'null' },
  { name: 'a JSON number', contentType: 'application/json', body: '42' },
  { name: 'an array', contentType: 'application/json', body: '[{"name":"x"}]' },
  { name: 'an empty body', contentType: 'application/json', body: '' },
  { name: '10,000 nested arrays', contentType: 'application/json', body: deepArrays(10_000) },
  { name: '10,000 nested objects', contentType: 'application/json', body: `{"name":${deepObjects(10_000)}}` },
  { name: '300,000 nested arrays (just under 1 MB)', contentType: 'application/json', body: deepArrays(300_000) },
  {
    name: '250,000 empty objects in one array',
    contentType: 'application/json',
    body: `{"items":[${Array(250_000).fill('{}').join(',')}]}`,
  },
  {
    name: 'an object with 60,000 keys',
    contentType: 'application/json',
    body: `{${Array.from({ length: 60_000 }, (_, i) => `"k${i}":1`).join(',')}}`,
  },
  { name: 'a __proto__ key', contentType: 'application/json', body: '{"__proto__": {"isAdmin": true, "role": "admin"}}' },
  { name: 'a constructor.prototype key', contentType: 'application/json', body: '{"constructor": {"prototype": {"isAdmin": true}}}' },
  { name: 'a lone surrogate', contentType: 'application/json', body: '{"name": "\\ud800"}' },
  { name: 'a byte-order mark before the JSON', contentType: 'application/json', body: '\ufeff{"name": 1}' },
  {
    name: 'invalid UTF-8',
    contentType: 'application/json',
    body: Buffer.from([0x7b, 0x22, 0x6e, 0x22, 0x3a, 0x22, 0xff, 0xfe, 0xc3, 0x22, 0x7d]),
  },
  { name: 'a body over 1 MB', contentType: 'application/json', body: JSON.stringify({ name: 'x'.repeat(1024 * 1024 + 10) }) },
  { name: 'JSON sent as text/plain', contentType: 'text/plain', body: '{"name": 1}' },
  { name: 'no content type', body: Buffer.from('{"name": 1}') },
  {
    name: 'a form with nested and __proto__ keys',
    contentType: 'application/x-www-form-urlencoded',
    body: 'name=1&__proto__[isAdmin]=1&a[b][c][d][e][f][g][h]=1',
  },
  {
    name: 'a form with 5,000 fields',
    contentType: 'application/x-www-form-urlencoded',
    body: Array.from({ length: 5000 }, (_, i) => `f${i}=1`).join('&'),
  },
  {
    name: 'multipart',
    contentType: 'multipart/form-data; boundary=b',
    body: '--b\r\nContent-Disposition: form-data; name="name"\r\n\r\n1\r\n--b--\r\n',
  },
  { name: 'broken multipart', contentType: 'multipart/form-data', body: 'no boundary here' },
  {
    name: 'XML with an external entity',
    contentType: 'application/xml',
    body: '<?xml version="1.0"?><!DOCTYPE x [<!ENTITY e SYSTEM "file:///etc/passwd">]><x>&e;</x>',
  },
  { name: 'JSON in UTF-16', contentType: 'application/json; charset=utf-16', body: Buffer.from('{"name": 1}', 'utf16le') },
  { name: 'an unknown charset', contentType: 'application/json; charset=ebcdic-x', body: '{}' },
  { name: 'gzip-encoded garbage', contentType: 'application/json', contentEncoding: 'gzip', body: 'not gzip at all' },
  {
    name: 'a gzip bomb (20 kB inflating to 20 MB)',
    contentType: 'application/json',
    contentEncoding: 'gzip',
    body: gzipSync(Buffer.alloc(20_000_000, 0x20)),
  },
  { name: 'an unknown content encoding', contentType: 'application/json', contentEncoding: 'x-unknown', body: '{}' },
];

/** Path parameters no route should trip over. */
export const HOSTILE_IDS = [
  '0',
  '-1',
  '1.5',
  '1e3',
  'NaN',
  'Infinity',
  '2147483648',
  '9007199254740993',
  '99999999999999999999',
  '0x1F',
  '%20',
  '%00',
  '%ff',
  '%E2%80%AE1',
  "1'%20OR%20'1'='1",
  'x'.repeat(2000),
] as const;

/** Query values: the hostile scalars as text, repeated keys and bracket keys come from the caller. */
export const hostileQueryValue: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom(...NUMERIC_TEXT),
  fc.constantFrom(...EDGE_NUMBERS.map(String)),
  fc.constantFrom(...FORMULA_PAYLOADS),
  fc.constantFrom(...UNICODE_SAMPLES.filter((text) => !/\p{Surrogate}/u.test(text))),
  fc.constantFrom(...INJECTION_TEXT),
  fc.constantFrom(...PROTOTYPE_KEYS, 'true', 'false', 'null', 'undefined', '[]', '{}', 'x'.repeat(3000)),
  fc.string({ maxLength: 20 }),
);
