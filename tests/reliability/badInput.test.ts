// Bad input against the real app: every JSON body and query string the API takes, fed generated
// junk and mutated valid bodies, must be answered without a 500, refusals in our one error shape,
// and a refusal must leave nothing stored. Hostile text (SQL, HTML, control characters) is kept
// and given back as plain text, and uploads that lie about themselves are refused without a trace.
import { ListObjectsV2Command } from '@aws-sdk/client-s3';
import { sql } from 'drizzle-orm';
import fc from 'fast-check';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { upsertAccount } from '../../server/people/accountRepository';
import { buildTestApp, createScenario, s3ClientFor, signIn, testPassword, waitForMail, type TestApp } from '../support/apiHarness';
import { agentsFor, deckPlacementBody, otherDeviationBody, proposedConditions, requestAt } from '../support/requestFixtures';
import { binary, parseCsv, pdfText, unguard } from '../support/documents';
import { samplePdf, samplePhoto } from '../support/sampleFiles';
import { recordReliability } from './report';

type Answer = { status: number; text: string; body: any; headers: Record<string, string> };
type Agent = Awaited<ReturnType<typeof signIn>>;
type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

const tally = { cases: 0, failures: 0, lost: 0 };
const problems: string[] = [];
// The problems a test saw itself, so one test's finding does not fail the next.
const since = (start: number) => problems.slice(start);
const runs = (n: number) => ({ numRuns: n, endOnFailure: true });

// What is wrong with an answer, if anything: a 5xx, or a refusal not in { error: { code, message, fields? } }.
function shapeProblem(res: Answer): string | null {
  if (res.status >= 500) return `answered ${res.status}: ${res.text.slice(0, 300)}`;
  if (res.status < 400) return null;
  const e = res.body?.error;
  if (!e || typeof e !== 'object') return `refusal ${res.status} without an error object: ${res.text.slice(0, 200)}`;
  if (typeof e.code !== 'string' || !e.code || typeof e.message !== 'string' || !e.message) return `refusal ${res.status} without code and message: ${res.text.slice(0, 200)}`;
  if (Object.keys(e).some((k) => !['code', 'message', 'fields'].includes(k))) return `refusal ${res.status} carries more than code, message, fields`;
  if (e.fields !== undefined && (typeof e.fields !== 'object' || e.fields === null || Object.values(e.fields).some((v) => typeof v !== 'string'))) return 'fields are not field -> message';
  if (e.code === 'invalid_input' && (!e.fields || Object.keys(e.fields).length === 0)) return 'invalid_input names no field';
  if (!String(res.headers['content-type'] ?? '').startsWith('application/json')) return `refusal ${res.status} is not JSON`;
  return null;
}

// Counts the case; true when the answer is acceptable (its shape, and one of the statuses allowed).
function judge(res: Answer, what: string, allowed: number[]): boolean {
  tally.cases++;
  const problem = shapeProblem(res) ?? (allowed.includes(res.status) ? null : `answered ${res.status}, expected one of ${allowed.join('/')}: ${res.text.slice(0, 200)}`);
  if (problem) {
    tally.failures++;
    problems.push(`${what}: ${problem}`);
  }
  return !problem;
}

// Strings that have broken parsers and databases before.
const nastyStrings = [
  '',
  ' ',
  'NaN',
  'Infinity',
  '-Infinity',
  '-0',
  '1e309',
  '0x1F',
  'null',
  'undefined',
  'true',
  '[object Object]',
  '__proto__',
  "'; drop table change_requests; --",
  '<script>alert(1)</script>',
  '<img src=x onerror=alert(1)>',
  'line\r\nbreak',
  'nul\u0000inside',
  '\u0000',
  '\u202eevil\u202c',
  '\ud800',
  '𝔓𝔢𝔩𝔩𝔞𝔪 🌉',
  'ﷺ'.repeat(50),
  '%00%27%22',
  '../../../etc/passwd',
  '2027-02-30',
  '99999-12-31',
  '-100000-01-01T00:00:00Z',
  '00000000-0000-0000-0000-000000000000',
];
const huge = 'x'.repeat(120_000);

const junkString = fc.oneof(
  fc.constantFrom(...nastyStrings),
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.string({ unit: 'grapheme', maxLength: 20 }),
  fc.constant(huge),
);
const junkLeaf: fc.Arbitrary<Json> = fc.oneof(
  junkString,
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.constantFrom(0, -1, 1e308, Number.MAX_SAFE_INTEGER + 2, 0.5, true, false, null),
);
const junk: fc.Arbitrary<Json> = fc.oneof(
  { weight: 3, arbitrary: junkLeaf },
  { weight: 1, arbitrary: fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json> },
  { weight: 1, arbitrary: fc.array(junkLeaf, { maxLength: 5 }) },
  { weight: 1, arbitrary: fc.dictionary(junkString.filter((k) => k.length < 60), junkLeaf, { maxKeys: 4 }) },
  // Deep nesting, well under the body limit.
  { weight: 1, arbitrary: fc.integer({ min: 50, max: 2000 }).map((depth) => JSON.parse('['.repeat(depth) + ']'.repeat(depth)) as Json) },
);
const anyBody: fc.Arbitrary<Json> = fc.oneof(fc.jsonValue({ maxDepth: 4 }) as fc.Arbitrary<Json>, fc.dictionary(fc.string({ maxLength: 20 }), junk, { maxKeys: 6 }), junk);

// Every path into a JSON value, to mutate one place of a valid body.
function pathsOf(value: Json, at: (string | number)[] = []): (string | number)[][] {
  const here = at.length ? [at] : [];
  if (Array.isArray(value)) return [...here, ...value.flatMap((v, i) => pathsOf(v, [...at, i]))];
  if (value && typeof value === 'object') return [...here, ...Object.entries(value).flatMap(([k, v]) => pathsOf(v, [...at, k]))];
  return here;
}
function objectPathsOf(value: Json, at: (string | number)[] = []): (string | number)[][] {
  if (Array.isArray(value)) return value.flatMap((v, i) => objectPathsOf(v, [...at, i]));
  if (value && typeof value === 'object') return [at, ...Object.entries(value).flatMap(([k, v]) => objectPathsOf(v, [...at, k]))];
  return [];
}
function parentOf(root: Json, path: (string | number)[]): any {
  let node: any = root;
  for (const key of path.slice(0, -1)) node = node[key];
  return node;
}

type Mutation = { op: 'set' | 'delete' | 'extra' | 'huge'; pick: number; value: Json; key: string };
const mutation: fc.Arbitrary<Mutation> = fc.record({
  op: fc.constantFrom('set', 'set', 'delete', 'extra', 'huge'),
  pick: fc.nat(),
  value: junk,
  key: fc.string({ minLength: 1, maxLength: 12 }).map((k) => `x_${k}`),
});

// The mutated copy, and the field a strict schema must name when it refuses an extra field.
function mutate(valid: Json, m: Mutation): { body: Json; extraKey?: string } {
  const body = structuredClone(valid);
  if (m.op === 'extra') {
    const objects = objectPathsOf(body);
    const path = objects[m.pick % objects.length]!;
    const target = path.reduce<any>((node, key) => node[key], body);
    (target as Record<string, Json>)[m.key] = m.value;
    return { body, extraKey: m.key };
  }
  const paths = pathsOf(body);
  const path = paths[m.pick % paths.length]!;
  const parent = parentOf(body, path);
  const key = path.at(-1)!;
  if (m.op === 'delete') {
    if (Array.isArray(parent)) parent.splice(Number(key), 1);
    else delete parent[key];
  } else parent[key] = m.op === 'huge' ? huge : m.value;
  return { body };
}

describe('bad input', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  let victimId: string;
  let draftId: string;
  let draftVersion: number;
  let eorId: string;
  let eorVersion: number;

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    // A person whose role and organization the administrator's bodies may change freely.
    victimId = await upsertAccount(t.db, { email: `victim-${randomUUID().slice(0, 8)}@test.spanrelay.test`, name: 'Orrin Vale', role: 'contractor', organization: 'Corbel & Fane Constructors', password: testPassword });
    const draft = (await a.contractor.post('/api/requests').send(otherDeviationBody(s.project.id))).body;
    draftId = draft.id;
    draftVersion = draft.version;
    const eor = await requestAt(t, s, a, 'eor_review');
    eorId = eor.id;
    eorVersion = eor.version();
  });

  afterAll(async () => {
    recordReliability({
      category: 'bad input',
      cases: tally.cases,
      failures: tally.failures,
      lost: tally.lost,
      note: problems.length ? problems.slice(0, 5).join(' | ') : 'generated and fixed bodies, queries, hostile text and lying uploads',
    });
    await t?.close();
  });

  // What a refused write must leave unchanged: rows of this scenario's requests, trail, conditions,
  // files, memberships, invitations and people.
  async function footprint(): Promise<string> {
    const r = await t.db.execute(sql`select
      (select count(*) from change_requests where project_id in (${s.project.id}, ${s.otherProject.id})) as requests,
      (select count(*) from trail_events e join change_requests c on c.id = e.request_id where c.project_id = ${s.project.id}) as trail,
      (select count(*) from request_revisions v join change_requests c on c.id = v.request_id where c.project_id = ${s.project.id}) as revisions,
      (select count(*) from request_conditions k join change_requests c on c.id = k.request_id where c.project_id = ${s.project.id}) as conditions,
      (select count(*) from attachments f join change_requests c on c.id = f.request_id where c.project_id = ${s.project.id}) as files,
      (select count(*) from project_members where project_id in (${s.project.id}, ${s.otherProject.id})) as members,
      (select count(*) from invitations) as invitations,
      (select count(*) from users) as people,
      (select desk_due_days::text from projects where id = ${s.project.id}) as due,
      (select role || coalesce(organization, '') from users where id = ${victimId}) as victim,
      (select version from change_requests where id = ${draftId}) as draft_version`);
    return JSON.stringify(r.rows[0]);
  }

  // One write case: judged, and a refusal must leave the footprint as it was.
  async function write(what: string, send: () => Promise<Answer>, allowed: number[]): Promise<Answer> {
    const before = await footprint();
    const res = await send();
    const ok = judge(res, what, allowed);
    if (res.status >= 400 && (await footprint()) !== before) {
      tally.lost++;
      problems.push(`${what}: a refused write (${res.status}) changed what is stored`);
      return { ...res, status: -1 };
    }
    return ok ? res : { ...res, status: -1 };
  }

  type Route = { name: string; agent: () => Agent | ReturnType<typeof request>; method: 'post' | 'put' | 'patch'; path: () => string; valid: () => Json; allowed: number[] };
  const anon = () => request(t.app);
  const routes: Route[] = [
    { name: 'create draft (other deviation)', agent: () => a.contractor, method: 'post', path: () => '/api/requests', valid: () => otherDeviationBody(s.project.id) as unknown as Json, allowed: [201, 400, 404] },
    { name: 'create draft (deck placement)', agent: () => a.contractor, method: 'post', path: () => '/api/requests', valid: () => deckPlacementBody(s.project.id) as unknown as Json, allowed: [201, 400, 404] },
    { name: 'save draft', agent: () => a.contractor, method: 'put', path: () => `/api/requests/${draftId}/draft`, valid: () => ({ version: draftVersion, body: otherDeviationBody(s.project.id) as unknown as Json }), allowed: [200, 400, 409] },
    { name: 'move: approve with conditions', agent: () => a.engineer_of_record, method: 'post', path: () => `/api/requests/${eorId}/events`, valid: () => ({ type: 'approve_with_conditions', version: eorVersion, comment: 'Approved on the terms below.', conditions: proposedConditions }), allowed: [200, 400, 403, 404, 409] },
    { name: 'move: route', agent: () => a.central_office, method: 'post', path: () => `/api/requests/${eorId}/events`, valid: () => ({ type: 'reassign', version: eorVersion, eorUserId: s.secondEor.id, comment: 'Workload.' }), allowed: [200, 400, 403, 404, 409] },
    { name: 'move: satisfy condition', agent: () => a.field_inspector, method: 'post', path: () => `/api/requests/${eorId}/events`, valid: () => ({ type: 'satisfy_condition', version: eorVersion, conditionId: randomUUID(), comment: 'Seen on site.', evidenceAttachmentId: randomUUID() }), allowed: [200, 400, 403, 404, 409] },
    { name: 'comment', agent: () => a.section_engineer, method: 'post', path: () => `/api/requests/${eorId}/comments`, valid: () => ({ comment: 'Checked the pier cap detail.' }), allowed: [201, 400] },
    { name: 'admin: change person', agent: () => a.admin, method: 'patch', path: () => `/api/admin/people/${victimId}`, valid: () => ({ role: 'field_inspector', organization: 'Tallis County' }), allowed: [200, 400, 404, 409] },
    { name: 'admin: desk due days', agent: () => a.admin, method: 'patch', path: () => `/api/admin/projects/${s.otherProject.id}`, valid: () => ({ deskDueDays: { section_engineer: 5, central_office: 5, engineer_of_record: 10, contractor: 7, field_inspector: 7 } }), allowed: [200, 400, 404] },
    { name: 'admin: add member', agent: () => a.admin, method: 'post', path: () => `/api/admin/projects/${s.otherProject.id}/members`, valid: () => ({ userId: victimId }), allowed: [200, 400, 404, 409] },
    { name: 'admin: invite', agent: () => a.admin, method: 'post', path: () => '/api/admin/invitations', valid: () => ({ email: `invitee-${randomUUID().slice(0, 6)}@test.spanrelay.test`, name: 'Ada Pellam', role: 'field_inspector', organization: 'Marrowfield State Highway Department', projectIds: [s.project.id] }), allowed: [201, 400, 404, 409] },
    { name: 'invitation preview', agent: anon, method: 'post', path: () => '/api/invitations/preview', valid: () => ({ token: 'a'.repeat(43) }), allowed: [400, 404, 410] },
    { name: 'invitation accept', agent: anon, method: 'post', path: () => '/api/invitations/accept', valid: () => ({ token: 'b'.repeat(43), name: 'Ada Pellam', password: 'pier cap 27 west' }), allowed: [400, 404, 410] },
  ];

  // Sent as JSON text, so primitives and lone surrogates reach the parser as they are.
  const send = (r: Route, body: unknown) => (r.agent() as any)[r.method](r.path()).set('content-type', 'application/json').send(JSON.stringify(body)) as Promise<Answer>;
  // A generated body past the 256 kB limit is answered 413 before any route reads it.
  const overLimit = (body: unknown) => Buffer.byteLength(JSON.stringify(body)) > 256 * 1024;

  it('starts from bodies the product really takes', async () => {
    // A base that is already invalid would only test the refusal of a bad base, field after field.
    const expected: Record<string, number> = { 'create draft (other deviation)': 201, 'create draft (deck placement)': 201, 'save draft': 200, 'admin: change person': 200, 'admin: desk due days': 200 };
    for (const [name, status] of Object.entries(expected)) {
      const r = routes.find((x) => x.name === name)!;
      const res = await send(r, r.valid());
      expect(res.status, `${name}: ${res.text}`).toBe(status);
      if (name === 'save draft') draftVersion = res.body.version;
    }
  });

  it('answers any JSON body to every write with 2xx or a 400 in the error shape, never a 500', async () => {
    const start = problems.length;
    for (const r of routes) {
      await fc.assert(
        fc.asyncProperty(anyBody, async (body) => {
          const res = await write(`${r.name} <- ${JSON.stringify(body).slice(0, 120)}`, () => send(r, body), overLimit(body) ? [413] : r.allowed);
          return res.status !== -1;
        }),
        runs(25),
      );
    }
    expect(since(start)).toEqual([]);
  }, 240_000);

  it('refuses mutated valid bodies field by field, and names every extra field', async () => {
    const start = problems.length;
    for (const r of routes) {
      await fc.assert(
        fc.asyncProperty(mutation, async (m) => {
          const { body, extraKey } = mutate(r.valid(), m);
          const what = `${r.name} ${m.op} <- ${JSON.stringify(body).slice(0, 160)}`;
          const res = await write(what, () => send(r, body), overLimit(body) ? [413] : extraKey ? [400] : r.allowed);
          if (res.status === -1) return false;
          // Named bare by the schema, or within its whole path when the NUL check caught it first.
          if (extraKey && res.status === 400 && !Object.keys(res.body.error.fields ?? {}).some((f) => `.${f}.`.includes(`.${extraKey}.`))) {
            tally.failures++;
            problems.push(`${what}: the extra field ${extraKey} is not named`);
            return false;
          }
          if (res.status === 200 && r.name.startsWith('move')) eorVersion = res.body.version;
          if (res.status === 200 && r.name === 'save draft') draftVersion = res.body.version;
          return true;
        }),
        runs(30),
      );
    }
    expect(since(start)).toEqual([]);
  }, 240_000);

  it('answers malformed JSON with 400, a body over 256 kB with 413, and a non-JSON body with 400', async () => {
    const start = problems.length;
    const big = JSON.stringify({ comment: 'y'.repeat(300 * 1024) });
    const malformed = ['{', '{"title": }', "{'single': 1}", '{"a":1,}', '[1, 2', 'nul', '{"a": NaN}', '{"a": Infinity}', '\u0000', '"just a string"', '42'];
    for (const r of routes) {
      for (const text of malformed) {
        const res = await write(`${r.name} <- malformed ${JSON.stringify(text)}`, () => (r.agent() as any)[r.method](r.path()).set('content-type', 'application/json').send(text), [400]);
        if (res.status === 400) expect(res.body.error.code).toBe('malformed_body');
      }
      const tooBig = await write(`${r.name} <- 300 kB`, () => (r.agent() as any)[r.method](r.path()).set('content-type', 'application/json').send(big), [413]);
      if (tooBig.status === 413) expect(tooBig.body.error.code).toBe('body_too_large');
      await write(`${r.name} <- text/plain`, () => (r.agent() as any)[r.method](r.path()).set('content-type', 'text/plain').send(JSON.stringify(r.valid())), [400]);
      await write(`${r.name} <- urlencoded`, () => (r.agent() as any)[r.method](r.path()).type('form').send('title=x&version=1'), [400]);
    }
    expect(since(start)).toEqual([]);
  }, 120_000);

  // Query strings: the register, its counts, the conditions list and the trail search.
  type Query = { name: string; agent: () => Agent; path: string; keys: string[]; valid: Record<string, string> };
  const queries: Query[] = [
    { name: 'register', agent: () => a.contractor, path: '/api/requests', keys: ['desk', 'atDesk', 'state', 'type', 'projectId', 'q', 'sort', 'cursor', 'limit'], valid: { desk: 'all', sort: 'due', q: 'drain', limit: '10' } },
    { name: 'counts', agent: () => a.section_engineer, path: '/api/requests/counts', keys: ['desk', 'atDesk', 'state', 'type', 'projectId', 'q'], valid: { desk: 'mine', state: 'eor_review' } },
    { name: 'conditions', agent: () => a.field_inspector, path: '/api/conditions', keys: ['status', 'projectId'], valid: { status: 'all' } },
    { name: 'trail search', agent: () => a.auditor, path: '/api/trail/search', keys: ['number', 'structure', 'person', 'from', 'to', 'decision', 'cursor', 'limit'], valid: { person: 'contractor', from: '2026-01-01', to: '2027-12-31', limit: '5' } },
  ];
  const cursorOf = (key: Json, id: Json) => Buffer.from(JSON.stringify([key, id])).toString('base64url');
  const queryValue = fc.oneof(
    junkString.filter((v) => v.length < 2000),
    fc.tuple(fc.constantFrom(...nastyStrings, '1', '2027', '0', '-1', 'infinity', '2026-13-01', '275760-09-13T00:00:00Z'), fc.constantFrom(randomUUID(), 'x', 5 as Json)).map(([k, id]) => cursorOf(k, id)),
  );
  // Byte by byte, so a lone surrogate goes out as the UTF-8 the browser would send.
  const encodeAll = (v: string) => [...Buffer.from(v, 'utf8')].map((b) => (/[A-Za-z0-9_.~-]/.test(String.fromCharCode(b)) ? String.fromCharCode(b) : `%${b.toString(16).padStart(2, '0').toUpperCase()}`)).join('');
  const rawPiece = fc.oneof(fc.constantFrom('%', '%zz', '%E0%A4%A', '%C0%AF', '&&', '=', '==x', '%00', '+', 'a[b]=c', 'a[]=1&a[]=2'), fc.string({ maxLength: 10 }));

  it('answers any query string with 200 or a 400 in the error shape', async () => {
    const start = problems.length;
    for (const q of queries) {
      const pairs = fc.array(fc.tuple(fc.oneof(fc.constantFrom(...q.keys), fc.string({ maxLength: 8 })), queryValue, fc.boolean()), { maxLength: 5 });
      await fc.assert(
        fc.asyncProperty(pairs, fc.option(rawPiece), async (list, raw) => {
          const qs = list.map(([k, v, repeat]) => `${encodeAll(k)}=${encodeAll(v)}${repeat ? `&${encodeAll(k)}=${encodeAll(v)}` : ''}`).concat(raw ? [raw] : []).join('&');
          const res = (await q.agent().get(`${q.path}?${qs}`)) as Answer;
          return judge(res, `${q.name} ?${qs.slice(0, 200)}`, [200, 400]);
        }),
        runs(60),
      );
      // One valid parameter at a time swapped for junk; an unknown parameter must be refused.
      await fc.assert(
        fc.asyncProperty(fc.constantFrom(...q.keys), queryValue, async (key, value) => {
          const params = new URLSearchParams({ ...q.valid, [key]: value });
          const res = (await q.agent().get(`${q.path}?${params}`)) as Answer;
          return judge(res, `${q.name} ?${params.toString().slice(0, 200)}`, [200, 400]);
        }),
        runs(40),
      );
      const unknown = (await q.agent().get(`${q.path}?${new URLSearchParams({ ...q.valid, deskk: 'mine' })}`)) as Answer;
      if (judge(unknown, `${q.name} with an unknown parameter`, [400])) expect(unknown.body.error.fields).toHaveProperty('deskk');
      const valid = (await q.agent().get(`${q.path}?${new URLSearchParams(q.valid)}`)) as Answer;
      judge(valid, `${q.name} valid`, [200]);
    }
    expect(since(start)).toEqual([]);
  }, 240_000);
  // The account routes are better-auth's own, with its own refusal shape; junk must still never be a 5xx.
  it('answers junk sent to the account routes without a 5xx', async () => {
    const start = problems.length;
    const paths = ['/api/auth/sign-in/email', '/api/auth/request-password-reset', '/api/auth/reset-password'];
    for (const path of paths) {
      await fc.assert(
        fc.asyncProperty(anyBody, async (body) => {
          tally.cases++;
          const res = (await request(t.app).post(path).set('origin', t.env.PUBLIC_URL).set('content-type', 'application/json').send(JSON.stringify(body))) as Answer;
          if (res.status < 500) return true;
          tally.failures++;
          problems.push(`${path} <- ${JSON.stringify(body).slice(0, 120)}: answered ${res.status}: ${res.text.slice(0, 200)}`);
          return false;
        }),
        runs(20),
      );
    }
    const fixed: [string, Json][] = [
      ['/api/auth/sign-in/email', { email: `${s.contractor.email}\u0000`, password: 'x\u0000y' }],
      ['/api/auth/sign-in/email', { email: s.contractor.email, password: huge }],
      ['/api/auth/request-password-reset', { email: `nul\u0000@test.spanrelay.test`, redirectTo: '/reset-password' }],
      ['/api/auth/request-password-reset', { email: s.contractor.email, redirectTo: 'https://elsewhere.example/steal' }],
      ['/api/auth/reset-password', { token: "'; drop table users; --", newPassword: 'pier cap 27 west' }],
    ];
    for (const [path, body] of fixed) {
      tally.cases++;
      const res = (await request(t.app).post(path).set('origin', t.env.PUBLIC_URL).send(body as object)) as Answer;
      if (res.status >= 500) {
        tally.failures++;
        problems.push(`${path} <- ${JSON.stringify(body).slice(0, 120)}: answered ${res.status}: ${res.text.slice(0, 200)}`);
      }
    }
    expect(since(start)).toEqual([]);
  }, 120_000);

  it('knows a bad answer when it sees one', () => {
    const json = { 'content-type': 'application/json; charset=utf-8' };
    expect(shapeProblem({ status: 500, text: 'boom', body: {}, headers: json })).toMatch(/500/);
    expect(shapeProblem({ status: 400, text: '', body: { message: 'no' }, headers: json })).toMatch(/error object/);
    expect(shapeProblem({ status: 400, text: '', body: { error: { code: 'invalid_input', message: 'x' } }, headers: json })).toMatch(/names no field/);
    expect(shapeProblem({ status: 400, text: '', body: { error: { code: 'x', message: 'y', stack: 'at' } }, headers: json })).toMatch(/more than/);
    expect(shapeProblem({ status: 404, text: '<html>', body: {}, headers: { 'content-type': 'text/html' } })).not.toBeNull();
    expect(shapeProblem({ status: 400, text: '', body: { error: { code: 'invalid_input', message: 'y', fields: { title: 'Enter a title.' } } }, headers: json })).toBeNull();
  });

  it('refuses cursors this server never gave out with 400, times PostgreSQL cannot hold included', async () => {
    const start = problems.length;
    const id = randomUUID();
    const keys: Json[] = ['1', '2027', '0', '-1', 'infinity', '-infinity', 'epoch', '-100000-01-01T00:00:00Z', '+275760-09-13T00:00:00Z', '2026-02-30', 'Tue, 01 Dec 2026 10:00:00', 'now', 5, null];
    for (const q of queries.filter((x) => x.keys.includes('cursor'))) {
      for (const key of keys) {
        const cursor = cursorOf(key, id);
        const res = (await q.agent().get(`${q.path}?${new URLSearchParams({ ...q.valid, cursor })}`)) as Answer;
        judge(res, `${q.name} cursor [${JSON.stringify(key)}, id]`, [200, 400]);
      }
      for (const cursor of ['', '!!!', 'e30', cursorOf(['a'], id).slice(0, 10), 'W10', Buffer.from('[').toString('base64url')]) {
        const res = (await q.agent().get(`${q.path}?${new URLSearchParams({ ...q.valid, cursor })}`)) as Answer;
        judge(res, `${q.name} cursor ${cursor}`, [200, 400]);
      }
    }
    expect(since(start)).toEqual([]);
  });

  describe('hostile text', () => {
    const sqlText = "'; drop table change_requests; --";
    const scriptText = '<script>alert(1)</script>';
    const imgText = '<img src=x onerror=alert(document.domain)>';
    const controls = 'bell\u0007 tab\t esc\u001b[31m del\u007f cr\r lf\n end';
    const hostile = `${sqlText} ${scriptText} ${imgText} ${controls} 𝔓ellam 🌉 \u202eRTL\u202c "quoted", 'single'`;
    const title = `Drain ${sqlText} ${scriptText}`;
    const comment = `Note ${hostile}`;
    const conditionText = `Hold ${imgText} ${sqlText}`;
    let id: string;

    const plainJson = (res: Answer) => {
      expect(res.headers['content-type']).toMatch(/^application\/json/);
      expect(res.headers['x-content-type-options']).toBe('nosniff');
    };

    it('keeps SQL, HTML and control characters byte for byte as plain text through the whole desk path', async () => {
      const body = { ...otherDeviationBody(s.project.id, title), location: { span: sqlText.slice(0, 40), station: scriptText, description: `${imgText} ${controls}` }, planSheets: [scriptText, sqlText], reason: hostile, proposedChange: hostile };
      const created = (await a.contractor.post('/api/requests').send(body)) as Answer;
      expect(judge(created, 'hostile create', [201]), created.text).toBe(true);
      plainJson(created);
      id = created.body.id;
      // Read back as the contractor: a draft is not yet the desks' to read.
      const back = (await a.contractor.get(`/api/requests/${id}`)) as Answer;
      plainJson(back);
      expect(back.body.title).toBe(title);
      const revision = back.body.revisions?.at(-1)?.body ?? back.body.body;
      expect(JSON.stringify(back.body)).toContain(JSON.stringify(hostile));
      if (revision) expect(revision.location).toEqual(body.location);
      let version: number = created.body.version;
      const move = async (agent: Agent, event: Record<string, unknown>) => {
        const res = (await agent.post(`/api/requests/${id}/events`).send({ version, ...event })) as Answer;
        expect(judge(res, `hostile ${String(event.type)}`, [200]), res.text).toBe(true);
        version = res.body.version;
        return res;
      };
      await move(a.contractor, { type: 'submit', comment });
      await move(a.section_engineer, { type: 'forward', comment: scriptText });
      await move(a.central_office, { type: 'route', eorUserId: s.members.engineer_of_record.id });
      const decided = await move(a.engineer_of_record, { type: 'approve_with_conditions', comment, conditions: [{ text: conditionText, dueBefore: scriptText }] });
      expect(decided.body.conditions.map((c: { text: string; dueBefore: string }) => [c.text, c.dueBefore])).toEqual([[conditionText, scriptText]]);
      const said = (await a.contractor.post(`/api/requests/${id}/comments`).send({ comment })) as Answer;
      expect(judge(said, 'hostile comment', [201]), said.text).toBe(true);
      expect(said.body.trail.filter((e: { comment: string | null }) => e.comment === comment)).toHaveLength(3);

      const open = (await a.field_inspector.get(`/api/conditions?${new URLSearchParams({ projectId: s.project.id })}`)) as Answer;
      plainJson(open);
      expect(JSON.stringify(open.body)).toContain(JSON.stringify(conditionText));
      // The SQL is a search term like any other: it finds the request by its title.
      const found = (await a.contractor.get(`/api/requests?${new URLSearchParams({ desk: 'all', q: sqlText })}`)) as Answer;
      expect(found.status).toBe(200);
      expect(found.body.items.map((r: { id: string }) => r.id)).toContain(id);
      const searched = (await a.auditor.get(`/api/trail/search?${new URLSearchParams({ person: scriptText })}`)) as Answer;
      expect(searched.status).toBe(200);
      tally.cases += 9;
    });

    it('carries the text as text in the trail CSV and the decision record PDF', async () => {
      const csv = (await a.auditor.get(`/api/requests/${id}/trail.csv`)) as Answer;
      expect(csv.status).toBe(200);
      expect(csv.headers['content-type']).toMatch(/^text\/csv/);
      const cells = parseCsv(csv.text).flat().map(unguard);
      expect(cells.filter((c) => c === comment)).toHaveLength(3);
      expect(cells).toContain(scriptText);
      const pdf = await a.auditor.get(`/api/requests/${id}/decision-record.pdf`).buffer(true).parse(binary);
      expect(pdf.status).toBe(200);
      expect(pdf.headers['content-type']).toBe('application/pdf');
      const text = await pdfText(pdf.body as Buffer);
      for (const piece of [sqlText, scriptText, imgText, conditionText]) expect(text).toContain(piece);
      tally.cases += 2;
    });

    it('keeps an invitation name as typed, from the list to the preview to the account', async () => {
      const email = `hostile-${randomUUID().slice(0, 8)}@test.spanrelay.test`;
      const name = `Ada ${imgText} O'Brien`;
      const organization = `${scriptText} & Sons`;
      const invited = (await a.admin.post('/api/admin/invitations').send({ email, name, role: 'field_inspector', organization, projectIds: [s.project.id] })) as Answer;
      expect(judge(invited, 'hostile invitation', [201]), invited.text).toBe(true);
      const listed = (await a.admin.get('/api/admin/invitations')) as Answer;
      expect(listed.body.find((i: { email: string }) => i.email === email)).toMatchObject({ name, organization });
      const mail = (await waitForMail(t.env, email))[0];
      const token = mail?.text.match(/token=([A-Za-z0-9_-]+)/)?.[1];
      expect(token).toBeTruthy();
      const preview = (await request(t.app).post('/api/invitations/preview').send({ token })) as Answer;
      expect(preview.status).toBe(200);
      expect(JSON.stringify(preview.body)).toContain(JSON.stringify(name));
      const accepted = (await request(t.app).post('/api/invitations/accept').send({ token, name: `${name} ${sqlText}`.slice(0, 120), password: 'pier cap 27 west' })) as Answer;
      expect(judge(accepted, 'hostile accept', [201]), accepted.text).toBe(true);
      const people = (await a.admin.get('/api/admin/people')) as Answer;
      expect(people.body.find((p: { email: string }) => p.email === email)).toMatchObject({ name: `${name} ${sqlText}`.slice(0, 120), organization });
      tally.cases += 3;
    });

    // PostgreSQL text cannot hold U+0000: it is refused in place, naming the field, and nothing is kept.
    it('refuses the NUL character with a 400 that names the field, wherever text goes in', async () => {
    const start = problems.length;
      const nul = 'pier\u0000cap';
      const eor = await requestAt(t, s, a, 'eor_review');
      const cases: [string, () => Promise<Answer>, string][] = [
        ['title', () => a.contractor.post('/api/requests').send(otherDeviationBody(s.project.id, `Drain ${nul}`)) as any, 'title'],
        ['location', () => a.contractor.post('/api/requests').send({ ...otherDeviationBody(s.project.id), location: { description: `at ${nul}` } }) as any, 'location.description'],
        ['draft', () => a.contractor.put(`/api/requests/${draftId}/draft`).send({ version: draftVersion, body: { ...otherDeviationBody(s.project.id), reason: `because ${nul} is wrong` } }) as any, 'body.reason'],
        ['comment', () => a.contractor.post(`/api/requests/${eor.id}/comments`).send({ comment: nul }) as any, 'comment'],
        ['move comment', () => a.engineer_of_record.post(`/api/requests/${eor.id}/events`).send({ type: 'reject', version: eor.version(), comment: `no ${nul}` }) as any, 'comment'],
        ['condition', () => a.engineer_of_record.post(`/api/requests/${eor.id}/events`).send({ type: 'approve_with_conditions', version: eor.version(), conditions: [{ text: `Hold ${nul}`, dueBefore: 'before placement' }] }) as any, 'conditions.0.text'],
        ['invitation name', () => a.admin.post('/api/admin/invitations').send({ email: `nul-${randomUUID().slice(0, 6)}@test.spanrelay.test`, name: nul, role: 'auditor', organization: '', projectIds: [] }) as any, 'name'],
        ['organization', () => a.admin.patch(`/api/admin/people/${victimId}`).send({ organization: nul }) as any, 'organization'],
        ['accept name', () => request(t.app).post('/api/invitations/accept').send({ token: 'c'.repeat(43), name: nul, password: 'pier cap 27 west' }) as any, 'name'],
        ['a key', () => a.contractor.post(`/api/requests/${eor.id}/comments`).send({ [nul]: 'x', comment: 'fine' }) as any, nul],
      ];
      for (const [what, go, field] of cases) {
        const res = await write(`NUL in ${what}`, go, [400]);
        if (res.status === 400) expect(Object.keys(res.body.error.fields ?? {}), what).toContain(field);
      }
      for (const [q, path] of [[queries[0]!, 'q'], [queries[1]!, 'q'], [queries[3]!, 'person']] as const) {
        const res = (await q.agent().get(`${q.path}?${new URLSearchParams({ [path]: nul })}`)) as Answer;
        if (judge(res, `NUL in ${q.name} ${path}`, [400])) expect(res.body.error.fields).toHaveProperty(path);
      }
      expect(since(start)).toEqual([]);
    });

    it('leaves every table in place', async () => {
      const r = await t.db.execute(sql`select to_regclass('public.change_requests') is not null as requests, to_regclass('public.users') is not null as people,
        to_regclass('public.trail_events') is not null as trail, (select count(*)::int from change_requests where project_id = ${s.project.id}) as n`);
      expect(r.rows[0]).toMatchObject({ requests: true, people: true, trail: true });
      expect(Number(r.rows[0]!.n)).toBeGreaterThan(2);
    });
  });

  describe('uploads that lie', () => {
    let id: string;
    const objectsUnder = async (prefix: string) => {
      const listed = await s3ClientFor(t.env).send(new ListObjectsV2Command({ Bucket: t.env.S3_BUCKET, Prefix: prefix }));
      return (listed.Contents ?? []).map((o) => o.Key!).sort();
    };
    const upload = (name: string, bytes: Buffer, contentType?: string) =>
      a.contractor.post(`/api/requests/${id}/attachments`).attach('files', bytes, contentType ? { filename: name, contentType } : name) as unknown as Promise<Answer>;

    let pdfBytes: Buffer;
    beforeAll(async () => {
      pdfBytes = await samplePdf();
      id = (await a.contractor.post('/api/requests').send(otherDeviationBody(s.project.id, 'Drain outlet files'))).body.id;
    });

    it('keeps only the base name of a path-like file name, under a key of our own', async () => {
      const res = await upload('../../etc/passwd.pdf', await samplePdf());
      expect(judge(res, 'upload ../../etc/passwd.pdf', [201]), res.text).toBe(true);
      expect(res.body[0].fileName).toBe('passwd.pdf');
      const keys = await objectsUnder(`projects/${s.project.id}/requests/${id}/`);
      expect(keys).toHaveLength(1);
      expect(keys[0]).toMatch(new RegExp(`^projects/${s.project.id}/requests/${id}/rev-1/[0-9a-f-]{36}$`));
      expect(await objectsUnder('etc/')).toEqual([]);
      const back = await a.contractor.get(`/api/attachments/${res.body[0].id}/content?download=1`);
      expect(back.headers['content-disposition']).toBe(`attachment; filename*=UTF-8''passwd.pdf`);
    });

    it('keeps names in any script, and refuses a name with a NUL character without a 500', async () => {
      const start = problems.length;
      for (const name of ['Pellam Creek сечение 🌉.pdf', "O'Brien; drop table attachments; --.pdf", '<img src=x onerror=alert(1)>.pdf', 'tab\there.pdf']) {
        const res = await write(`upload named ${JSON.stringify(name)}`, () => upload(name, pdfBytes), [201]);
        if (res.status === 201) {
          expect(res.body[0].fileName).toBe(name);
          const back = await a.contractor.get(`/api/attachments/${res.body[0].id}/content?download=1`);
          expect(back.headers['content-disposition']).toBe(`attachment; filename*=UTF-8''${encodeURIComponent(name)}`);
        }
      }
      await write('upload named with a NUL', () => upload('sheet\u0000.pdf', pdfBytes), [201, 400]);
      // Bodies the multipart parser cannot read are the sender's fault.
      const post = () => a.contractor.post(`/api/requests/${id}/attachments`);
      const boundary = '----spanrelay';
      const part = `--${boundary}\r\ncontent-disposition: form-data; name="files"; filename="a.pdf"\r\ncontent-type: application/pdf\r\n\r\n%PDF-1.4\n`;
      const broken: [string, () => Promise<Answer>][] = [
        ['no boundary', () => post().set('content-type', 'multipart/form-data').send('junk') as any],
        ['cut short', () => post().set('content-type', `multipart/form-data; boundary=${boundary}`).send(part) as any],
        ['bad part header', () => post().set('content-type', `multipart/form-data; boundary=${boundary}`).send(`--${boundary}\r\nno colon here\r\n\r\nx\r\n--${boundary}--\r\n`) as any],
        ['a field, not a file', () => post().field('note', 'hello').attach('files', pdfBytes, 'a.pdf') as any],
        ['the wrong field', () => post().attach('upload', pdfBytes, 'a.pdf') as any],
        ['no files', () => post().set('content-type', `multipart/form-data; boundary=${boundary}`).send(`--${boundary}--\r\n`) as any],
      ];
      for (const [what, go] of broken) await write(`upload ${what}`, go, [400]);
      expect(since(start)).toEqual([]);
    });

    it('refuses files whose name or bytes lie, with 415 and no row and no object left', async () => {
    const start = problems.length;
      const before = { rows: await footprint(), objects: await objectsUnder(`projects/${s.project.id}/`) };
      const mz = Buffer.concat([Buffer.from('MZ'), Buffer.alloc(62), Buffer.from('PE\u0000\u0000'), Buffer.alloc(200)]);
      const zip = Buffer.concat([Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 0, 7, 0, 0, 0]), Buffer.from('evil.sh'), Buffer.alloc(64)]);
      const lies: [string, Buffer, string | undefined, number, string][] = [
        ['drawing.pdf.exe', await samplePdf(), undefined, 415, 'unsupported_type'],
        ['drawing.pdf.exe', mz, 'application/pdf', 415, 'unsupported_type'],
        ['photo.jpg', Buffer.from('<!doctype html><html><body><script>alert(1)</script></body></html>'), 'image/jpeg', 415, 'unsupported_type'],
        ['photo.jpg', Buffer.from('alert(document.cookie); fetch("/api/me")'), 'image/jpeg', 415, 'unsupported_type'],
        ['detail.png', Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" onload="alert(1)"/>'), 'image/png', 415, 'unsupported_type'],
        ['sheet.pdf', zip, 'application/pdf', 415, 'unsupported_type'],
        ['sheet.pdf', Buffer.concat([(await samplePhoto()).subarray(0, 0), Buffer.from('%PDX-1.4 not quite')]), 'application/pdf', 415, 'unsupported_type'],
        ['report.html', await samplePdf(), 'text/html', 415, 'unsupported_type'],
        ['macro.svg', await samplePhoto(), 'image/svg+xml', 415, 'unsupported_type'],
        // The refusals the product already had still hold.
        ['notes.pdf', Buffer.from('<html><body>not a pdf</body></html>'), undefined, 415, 'unsupported_type'],
        ['tool.exe', Buffer.concat([Buffer.from('MZ'), Buffer.alloc(200)]), undefined, 415, 'unsupported_type'],
        ['clip.mp3', Buffer.concat([Buffer.from('ID3'), Buffer.from([4, 0, 0, 0, 0, 0]), Buffer.alloc(200)]), undefined, 415, 'unsupported_type'],
        ['empty.jpg', Buffer.alloc(0), undefined, 400, 'empty_file'],
      ];
      for (const [name, bytes, type, status, code] of lies) {
        const res = await write(`upload ${name} (${type ?? 'no type'}, ${bytes.subarray(0, 4).toString('hex')})`, () => upload(name, bytes, type), [status]);
        if (res.status === status) expect(res.body.error.code, name).toBe(code);
      }
      const mixed = await write('upload a good and a lying file together', () => a.contractor.post(`/api/requests/${id}/attachments`).attach('files', mz, 'a.pdf').attach('files', Buffer.from('plain'), 'b.pdf') as any, [415]);
      expect(mixed.status).toBe(415);
      const after = { rows: await footprint(), objects: await objectsUnder(`projects/${s.project.id}/`) };
      if (JSON.stringify(after) !== JSON.stringify(before)) tally.lost++;
      expect(after).toEqual(before);
      expect(since(start)).toEqual([]);
    });
  });
});
