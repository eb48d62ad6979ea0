import * as contracts from '@layerbook/contracts';
import fc from 'fast-check';
import { z } from 'zod';
import { signUpFirm, startTestServer, TestServer } from '../testing/harness';
import { HttpError } from './problem';
import { parse } from './validate';

/**
 * Property-based probes: whatever strings, numbers, dates and objects arrive, every schema answers
 * with data or a 400 naming fields, and no route of a real firm answers 5xx. The odd values are the
 * ones that broke us before (NUL, lone surrogates, year 0000, tampered cursors, stray `%`).
 */

const ODD_TEXT = [
  '',
  ' ',
  '\u0000',
  'a\u0000b',
  '\uD800',
  'x\uDFFFy',
  '0000-01-01',
  '0000-01-01 00:00:00+00',
  '9999-12-31',
  '2026-02-30',
  '-1',
  '1e309',
  'NaN',
  'Infinity',
  '%',
  '%E0%A4%A',
  '../../etc/passwd',
  "'; drop table clients; --",
  '__proto__',
  'constructor',
  'null',
  'x'.repeat(5000),
];

const isoOf = (d: Date) => (Number.isNaN(d.getTime()) ? 'Invalid Date' : d.toISOString());
const oddString = fc.oneof(
  fc.string(),
  fc.string({ unit: 'binary' }),
  // Any UTF-16 unit, lone surrogates included.
  fc.string({ unit: fc.nat(0xffff).map((n) => String.fromCharCode(n)) }),
  fc.constantFrom(...ODD_TEXT),
  fc.date({ noInvalidDate: false }).map(isoOf),
  fc.date({ noInvalidDate: true }).map((d) => d.toISOString().slice(0, 10)),
);
const oddNumber = fc.oneof(
  fc.integer(),
  fc.double(),
  fc.constantFrom(0, -0, 0.1 + 0.2, 1e308, -1e308, 2 ** 31, -(2 ** 31) - 1, Number.MAX_SAFE_INTEGER + 2, 1e-320),
);
const leaf = fc.oneof(oddString, oddNumber, fc.boolean(), fc.constant(null));
const oddValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: leaf },
  { weight: 1, arbitrary: fc.array(leaf, { maxLength: 4 }) },
  { weight: 1, arbitrary: fc.dictionary(oddString, leaf, { maxKeys: 4 }) },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
);

/** A body shaped like the schema's: some of its own keys (odd values), now and then a stray key. */
const bodyFor = (keys: readonly string[], base: Record<string, unknown> = {}) =>
  fc.oneof(
    { weight: 6, arbitrary: fc.dictionary(fc.constantFrom(...keys), oddValue, { maxKeys: 3 }).map((odd) => ({ ...base, ...odd })) },
    { weight: 1, arbitrary: fc.dictionary(fc.oneof(fc.constantFrom(...keys), oddString), oddValue, { maxKeys: 5 }) },
    { weight: 1, arbitrary: oddValue },
  );

const keysOf = (schema: z.ZodType): string[] => (schema instanceof z.ZodObject ? Object.keys(schema.shape) : []);

const SCHEMAS: Array<[string, z.ZodType]> = Object.entries(contracts as Record<string, unknown>).flatMap(([name, value]) =>
  value instanceof z.ZodType ? [[name, value] as [string, z.ZodType]] : [],
);

describe('every contract schema answers odd input with data or 400s naming fields', () => {
  it('finds the schemas to walk', () => {
    expect(SCHEMAS.length).toBeGreaterThan(40);
  });

  it.each(SCHEMAS)('%s', (_name, schema) => {
    const keys = keysOf(schema);
    fc.assert(
      fc.property(keys.length > 0 ? bodyFor(keys) : oddValue, (input) => {
        try {
          parse(schema, input);
        } catch (error) {
          if (!(error instanceof HttpError)) throw error;
          expect(error.status).toBe(400);
          expect(error.errors?.length).toBeGreaterThan(0);
          for (const problem of error.errors ?? []) expect(problem.field).toEqual(expect.any(String));
        }
      }),
      { numRuns: 150 },
    );
  });
});

/** The bytes of a query value as a browser would send them; a lone surrogate becomes U+FFFD. */
const encodeValue = (value: string) => encodeURIComponent(Buffer.from(value, 'utf8').toString('utf8'));
const queryFor = (keys: readonly string[]) =>
  fc
    .array(
      fc.tuple(fc.constantFrom(...keys), fc.oneof(oddString.map(encodeValue), fc.constantFrom('%', '%zz', '%E0%A4%A', '%00', 'a%2', ''))),
      { maxLength: 4 },
    )
    .map((pairs) => pairs.map(([k, v]) => `${k}=${v}`).join('&'));

type Route = { readonly method: 'post' | 'patch' | 'put'; readonly path: string; readonly schema: z.ZodType; readonly base?: object };

describe('the routes of one firm never answer 5xx to generated bodies, queries and ids', () => {
  let t: TestServer;
  let o: Awaited<ReturnType<typeof signUpFirm>>;
  let routes: Route[];
  beforeAll(async () => {
    t = await startTestServer();
    o = await signUpFirm(t.app, 'Fuzzwell Stucco');
    const post = async (path: string, body: object) => {
      const res = await o.agent.post(path).set('x-csrf-token', o.csrf()).send(body);
      if (res.status !== 201) throw new Error(`${path}: ${res.status} ${JSON.stringify(res.body)}`);
      return (res.body as { id: string }).id;
    };
    const client = await post('/api/clients', { kind: 'homeowner', name: 'Fenella Drage' });
    const site = await post(`/api/clients/${client}/sites`, { addressLine1: '2 Kiln Yard', city: 'Hobb' });
    const room = await post(`/api/takeoff/sites/${site}/rooms`, { name: 'Hall' });
    const inquiry = await post('/api/inquiries', { contactName: 'Fenella Drage', source: 'phone' });
    const estimate = await post('/api/estimates', { siteId: site, title: 'Hall plaster', startDate: '2027-01-04' });
    const board = await post('/api/samples', { clientId: client, label: 'Hall colours' });
    const firm = (await o.agent.get('/api/firm')).body as { slug: string };
    routes = [
      { method: 'post', path: '/api/clients', schema: contracts.clientCreate, base: { kind: 'homeowner', name: 'Fuzz' } },
      { method: 'patch', path: `/api/clients/${client}`, schema: contracts.clientUpdate },
      { method: 'post', path: `/api/clients/${client}/contacts`, schema: contracts.contactCreate, base: { name: 'Fuzz' } },
      { method: 'post', path: `/api/clients/${client}/sites`, schema: contracts.siteCreate, base: { addressLine1: '1 Row', city: 'Hobb' } },
      { method: 'patch', path: `/api/sites/${site}`, schema: contracts.siteUpdate },
      { method: 'post', path: '/api/inquiries', schema: contracts.inquiryCreate, base: { contactName: 'Fuzz', source: 'phone' } },
      { method: 'patch', path: `/api/inquiries/${inquiry}`, schema: contracts.inquiryUpdate },
      { method: 'post', path: `/api/inquiries/${inquiry}/activities`, schema: contracts.activityCreate },
      { method: 'post', path: `/api/inquiries/${inquiry}/stage`, schema: contracts.stageMove },
      { method: 'put', path: '/api/inquiries/stages', schema: contracts.stageLikelihoodUpdate },
      { method: 'post', path: `/api/takeoff/sites/${site}/rooms`, schema: contracts.roomInput, base: { name: 'Fuzz' } },
      { method: 'patch', path: `/api/takeoff/rooms/${room}`, schema: contracts.roomUpdate },
      { method: 'post', path: `/api/takeoff/rooms/${room}/surfaces`, schema: contracts.surfaceInput },
      { method: 'post', path: '/api/library/products', schema: contracts.productInput },
      { method: 'post', path: '/api/library/systems', schema: contracts.finishSystemInput },
      { method: 'patch', path: '/api/firm', schema: contracts.firmSettingsUpdate },
      { method: 'put', path: '/api/firm/estimating', schema: contracts.estimatingSettings },
      { method: 'post', path: '/api/estimates', schema: contracts.estimateCreate, base: { siteId: site } },
      { method: 'post', path: '/api/samples', schema: contracts.sampleBoardInput, base: { clientId: client } },
      { method: 'patch', path: `/api/samples/${board}`, schema: contracts.sampleBoardUpdate },
      { method: 'put', path: `/api/estimates/${estimate}/inputs`, schema: contracts.estimateInputs },
      { method: 'post', path: '/api/proposals', schema: contracts.proposalCreate, base: { estimateId: estimate } },
      { method: 'post', path: `/api/inquiries/${inquiry}/convert`, schema: contracts.inquiryConvert },
      { method: 'post', path: `/api/public/firms/${firm.slug}/inquiries`, schema: contracts.publicInquiryRequest },
    ];
  });
  afterAll(() => t.stop());

  const RUNS = 12;
  const expectNo5xx = (what: string, res: { status: number; body: unknown }) => {
    if (res.status >= 500) throw new Error(`${what} answered ${res.status}: ${JSON.stringify(res.body)}`);
  };

  it('bodies', async () => {
    for (const route of routes) {
      await fc.assert(
        fc.asyncProperty(bodyFor(keysOf(route.schema), route.base as Record<string, unknown> | undefined), async (body) => {
          // As JSON text, so a bare number or `true` goes out as written (lone surrogates as \ud800 escapes).
          const res = await o.agent[route.method](route.path)
            .set('x-csrf-token', o.csrf())
            .set('content-type', 'application/json')
            .send(JSON.stringify(body));
          expectNo5xx(`${route.method.toUpperCase()} ${route.path} ${JSON.stringify(body)}`, res);
        }),
        { numRuns: RUNS },
      );
    }
  });

  it('list queries', async () => {
    const lists: Array<[string, z.ZodType]> = [
      ['/api/inquiries', contracts.inquiryListQuery],
      ['/api/clients', contracts.clientListQuery],
      ['/api/estimates', contracts.estimateListQuery],
      ['/api/library/products', contracts.productListQuery],
      ['/api/library/systems', contracts.systemListQuery],
      ['/api/samples', contracts.sampleBoardListQuery],
      ['/api/proposals', contracts.proposalListQuery],
    ];
    for (const [path, schema] of lists) {
      await fc.assert(
        fc.asyncProperty(queryFor(keysOf(schema)), async (query) => {
          expectNo5xx(`GET ${path}?${query}`, await o.agent.get(`${path}?${query}`));
        }),
        { numRuns: RUNS * 2 },
      );
    }
  });

  it('ids in paths', async () => {
    const paths = ['/api/clients/', '/api/inquiries/', '/api/estimates/', '/api/proposals/', '/api/samples/', '/api/files/', '/api/jobs/'];
    const segment = fc.oneof(oddString.map(encodeValue), fc.uuid(), fc.constantFrom('%', '%zz', '%E0%A4%A', '..', '%2e%2e'));
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...paths), segment, async (path, id) => {
        expectNo5xx(`GET ${path}${id}`, await o.agent.get(`${path}${id}`));
      }),
      { numRuns: RUNS * 4 },
    );
  });
});
