import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import { api, shopRulesApi, type Endpoint } from '@fryline/schemas';
import { database } from '../src/db/sequelize.js';
import { Browser, signIn, useStack } from './support.js';

// Hostile input against every JSON route of the contract (so a route added to
// the contract is fuzzed without touching this file): wrong types, missing and
// extra fields, huge strings and numbers, deep nesting, __proto__/constructor
// keys, odd Unicode (NUL, lone surrogates, bidi controls) in bodies, query
// strings and path parameters. Every answer must be a 4xx, and no table may
// change. The owner is signed in, so role checks let the input reach
// validation; path ids never name an existing row, so even a body that
// happens to be valid can't change anything.

const RUNS = Number(process.env.FUZZ_RUNS ?? 1000);
const SEED = Number(process.env.FUZZ_SEED ?? 20261202);

const stack = useStack({ fresh: 'once', env: { RATE_LIMIT_SIGNIN: '1000000', RATE_LIMIT_ORDERS: '1000000', RATE_LIMIT_CANCEL: '1000000', RATE_LIMIT_WAITLIST: '1000000' } });

// the webhook takes a raw signed body (it has its own signature tests); the calendar is not JSON
const NOT_JSON = new Set(['/webhooks/payments', '/api/orders/:id/calendar.ics']);
const contract: Record<string, Endpoint> = { ...api, ...shopRulesApi };
const routes = Object.entries(contract).filter(([, e]) => !NOT_JSON.has(e.path));

const odd = ['\u0000', '\ud800', '\udfff', '\u202e', '\ufeff', '\u200b', 'e\u0301', '🍩', '\uffff', 'İ', '\r\n', '"', '\\', '%00', '../'];
const oddText = fc.oneof(
  fc.constantFrom(...odd),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.string({ unit: 'grapheme', maxLength: 40 }),
  fc.array(fc.constantFrom(...odd), { minLength: 1, maxLength: 8 }).map((parts) => parts.join('x')),
);
const hugeText = fc.integer({ min: 1_000, max: 60_000 }).map((n) => 'é'.repeat(n));
// In a URL, 'é' is six bytes once percent-encoded and Node refuses a request head over 16 KB (431)
// before any of our code runs: long path and query text stays mostly under that, so it reaches
// routing and validation, and now and then goes over it.
const longUrlText = fc.oneof(
  { arbitrary: fc.integer({ min: 300, max: 2_500 }).map((n) => 'é'.repeat(n)), weight: 9 },
  { arbitrary: fc.constant('é'.repeat(20_000)), weight: 1 },
);
const numberText = fc.oneof(
  fc.integer().map(String),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map((d) => JSON.stringify(d)),
  fc.constantFrom('1e999', '-1e999', '1e-999', '123456789012345678901234567890', '9007199254740993', '-0', '0.1', '2147483648', '-2147483649', '1.0000000000000002'),
);
const specialKey = fc.constantFrom('__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'valueOf', '', ' ', '$where', 'then');

/** JSON text, built by hand so keys like "__proto__" really appear in it. */
function jsonText(knownKeys: string[]) {
  const key = fc.oneof(specialKey, oddText, ...(knownKeys.length ? [fc.constantFrom(...knownKeys)] : []));
  const leaf = fc.oneof(numberText, fc.constantFrom('true', 'false', 'null'), oddText.map((s) => JSON.stringify(s)), hugeText.map((s) => JSON.stringify(s)));
  const { node } = fc.letrec<{ node: string }>((tie) => ({
    node: fc.oneof(
      { depthSize: 'small', withCrossShrink: true },
      leaf,
      fc.array(tie('node'), { maxLength: 4 }).map((xs) => `[${xs.join(',')}]`),
      fc.array(fc.tuple(key, tie('node')), { maxLength: 5 }).map((es) => `{${es.map(([k, v]) => `${JSON.stringify(k)}:${v}`).join(',')}}`),
    ),
  }));
  const deep = fc.tuple(fc.integer({ min: 30, max: 3_000 }), fc.boolean()).map(([n, arrays]) => (arrays ? `${'['.repeat(n)}1${']'.repeat(n)}` : `${'{"a":'.repeat(n)}1${'}'.repeat(n)}`));
  const broken = fc.constantFrom('{', '{"a":', '[1,]', '{"a" 1}', "{'a':1}", 'undefined', 'NaN', '\u0000', '{"a":1}{"b":2}', '');
  // an object of the route's own fields with wrong values, some missing, and extras
  const nearMiss = fc
    .tuple(fc.subarray(knownKeys), fc.array(fc.tuple(key, node), { maxLength: 3 }))
    .chain(([keys, extra]) => fc.tuple(fc.array(node, { minLength: keys.length, maxLength: keys.length }), fc.constant(keys), fc.constant(extra)))
    .map(([values, keys, extra]) => `{${[...keys.map((k, i) => [k, values[i]!] as const), ...extra].map(([k, v]) => `${JSON.stringify(k)}:${v}`).join(',')}}`);
  return fc.oneof(node, deep, broken, nearMiss, nearMiss);
}

/** Percent-encoding that also sends lone surrogates (as the invalid UTF-8 bytes a sloppy client would), where encodeURIComponent throws. */
function encodeLoose(text: string): string {
  // with the u flag the class matches only unpaired surrogates, which encodeURIComponent refuses
  if (!/[\uD800-\uDFFF]/u.test(text)) return encodeURIComponent(text);
  let out = '';
  for (const ch of text) {
    try {
      out += encodeURIComponent(ch);
    } catch {
      const u = ch.charCodeAt(0);
      out += [0xe0 | (u >> 12), 0x80 | ((u >> 6) & 0x3f), 0x80 | (u & 0x3f)].map((b) => `%${b.toString(16).toUpperCase()}`).join('');
    }
  }
  return out;
}

const queryPart = fc.oneof(
  fc.tuple(fc.oneof(specialKey, oddText, fc.constantFrom('a[b][c][d][e][f][g]', '__proto__[x]', 'constructor[prototype][x]', 'a[]', 'a[0]', 'a[999999]')), fc.oneof(oddText, longUrlText, numberText)).map(
    ([k, v]) => `${encodeLoose(k)}=${encodeLoose(v)}`,
  ),
  fc.constantFrom('a', '=', '&&', 'a=1&a=2&a=3', '%', '%zz', '%E0%A4%A', 'a=%00', '__proto__=1', 'constructor[prototype][admin]=true'),
);
const queryString = fc.array(queryPart, { minLength: 1, maxLength: 6 }).map((parts) => parts.join('&'));

/** A path parameter that names nothing: an unknown UUID, or not an id at all. */
const paramValue = fc.oneof(fc.uuid(), fc.uuid(), oddText, longUrlText, fc.constantFrom('0', '-1', 'null', 'undefined', '..', '%2e%2e', 'true'));

function keysOf(schema: unknown): string[] {
  let s = schema as { shape?: Record<string, unknown>; def?: { innerType?: unknown; in?: unknown; schema?: unknown } } | undefined;
  for (let i = 0; i < 5 && s && !s.shape; i += 1) s = (s.def?.innerType ?? s.def?.in ?? s.def?.schema) as typeof s;
  return s?.shape ? Object.keys(s.shape) : [];
}

/** Every table's content (sessions and rate-limit counters aside: reading a page may use them). */
async function fingerprint(): Promise<Record<string, string>> {
  const tables = await database().query<{ tablename: string }>(
    `SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename NOT IN ('session', 'rate_limit_hits') ORDER BY tablename`,
    { type: QueryTypes.SELECT },
  );
  const out: Record<string, string> = {};
  for (const { tablename } of tables) {
    const [row] = await database().query<{ digest: string | null; n: number }>(
      `SELECT md5(string_agg(t::text, '|' ORDER BY t::text)) AS digest, count(*)::int AS n FROM "${tablename}" t`,
      { type: QueryTypes.SELECT },
    );
    out[tablename] = `${row!.n}:${row!.digest}`;
  }
  return out;
}

async function pool<T>(items: T[], width: number, work: (item: T) => Promise<void>) {
  let next = 0;
  await Promise.all(Array.from({ length: width }, async () => {
    while (next < items.length) await work(items[next++]!);
  }));
}

describe(`fuzz: ${RUNS} hostile requests per JSON route of the contract`, () => {
  it('covers the contract', () => {
    expect(routes.length).toBeGreaterThan(20);
  });

  for (const [name, endpoint] of routes) {
    it(`${endpoint.method.toUpperCase()} ${endpoint.path} (${name}): only 4xx answers, nothing written`, async () => {
      const owner = new Browser(stack.url);
      await signIn(owner, 'owner@fryline.test');
      const token = await owner.csrf();
      const paramNames = [...endpoint.path.matchAll(/:([A-Za-z]+)/g)].map((m) => m[1]!);
      const hasBody = !['get', 'delete'].includes(endpoint.method);
      const cases = fc.sample(
        fc.record({
          params: fc.tuple(...paramNames.map(() => paramValue)),
          query: queryString,
          body: hasBody ? jsonText(keysOf(endpoint.body)) : fc.constant(undefined),
        }),
        { numRuns: RUNS, seed: SEED + name.length },
      );
      const before = await fingerprint();
      const wrong: string[] = [];
      // A read whose query is all optional may drop keys the parser refuses
      // (`__proto__`, empty names): then it must answer exactly as with no query at all.
      const plain = endpoint.method === 'get' && paramNames.length === 0 ? await (await owner.fetch(endpoint.path)).text() : undefined;
      await pool(cases, 16, async ({ params, query, body }) => {
        let i = 0;
        const path = endpoint.path.replace(/:([A-Za-z]+)/g, () => encodeLoose(params[i++]!));
        const res = await owner.fetch(`${path}?${query}`, {
          method: endpoint.method.toUpperCase(),
          headers: { 'content-type': 'application/json', 'x-csrf-token': token, 'idempotency-key': 'fuzz-key-0001' },
          body,
        });
        const text = await res.text();
        if (res.status === 200 && plain !== undefined && text === plain) return;
        if (res.status < 400 || res.status >= 500) wrong.push(`${res.status} for ${path}?${query.slice(0, 200)} body ${String(body).slice(0, 300)} → ${text.slice(0, 300)}`);
      });
      expect(wrong.slice(0, 5), `${wrong.length} of ${cases.length} requests answered outside 4xx`).toEqual([]);
      expect(await fingerprint()).toEqual(before);
    });
  }
});
