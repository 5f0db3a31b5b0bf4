// Who may call what: every route of the built app × signed out × every role, on the request's
// project and off it. The expected answers are written out by hand below, one row per route; the
// route list is read from the app itself, so a route that ships without a row fails this file.
import { randomBytes, randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { changeRequests } from '../../db/schema';
import { hashToken, invitationLifetimeMs } from '../../server/admin/invitationService';
import { replaceOpenInvitation } from '../../server/admin/invitationRepository';
import { upsertAccount } from '../../server/people/accountRepository';
import { roles, type Role } from '../../shared/roles';
import { deskRoles } from '../../shared/workflow/desks';
import { buildTestApp, createScenario, signIn, testPassword, type TestApp } from '../support/apiHarness';
import { agentsFor, otherDeviationBody, requestAt } from '../support/requestFixtures';
import { samplePhoto } from '../support/sampleFiles';
import { recordReliability } from './report';

type Agent = ReturnType<typeof request.agent>;
type Person = { id: string; email: string };
// Who is calling: the signed-out caller has no person and no role.
type Caller = { label: string; agent: Agent; person: Person | null; role: Role | null; member: boolean };
type Answer = { status: number; body: unknown; text: string };
type RouterLayer = { rawPath?: unknown; route?: { path: string; methods: Record<string, boolean> }; handle?: { stack?: RouterLayer[] } };

// The table's columns, in this file's own order (not the product's list of roles).
const columns: readonly Role[] = ['contractor', 'section_engineer', 'central_office', 'engineer_of_record', 'field_inspector', 'auditor', 'admin'];
type PerRole = readonly [number, number, number, number, number, number, number];
type Row = {
  name: string;
  // The route as the app declares it ("METHOD /path"); several rows may try one route.
  route: string;
  out: number;
  member: PerRole;
  outsider: PerRole;
  call: (c: Caller) => Promise<Answer>;
  // For lists: does this answer show anything of the scenario's project? Members must see it;
  // on another project nobody may, except the auditor where `auditorSeesAll`.
  shows?: (res: Answer) => boolean;
  auditorSeesAll?: boolean;
};

//                        contr sect  centr eor   field audit admin
const everyone200: PerRole = [200, 200, 200, 200, 200, 200, 200];
const adminOnly200: PerRole = [403, 403, 403, 403, 403, 403, 200];
const adminOnly201: PerRole = [403, 403, 403, 403, 403, 403, 201];
const adminOnly204: PerRole = [403, 403, 403, 403, 403, 403, 204];
// Reading one request or file: members and auditors; anyone else is told it does not exist.
const readsMember: PerRole = everyone200;
const readsOutsider: PerRole = [404, 404, 404, 404, 404, 200, 404];
const draftReadsMember: PerRole = [200, 404, 404, 404, 404, 200, 404];
const draftReadsOutsider: PerRole = readsOutsider;

describe('the access matrix of every route', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let callers: Caller[];
  let spare: Person;
  // Requests and files the rows act on.
  let draft: string; // drafting, with a photo and a second file to remove
  let photo: string;
  let draftFile: string;
  let review: string; // section_review, read and commented on
  let moving: string; // section_review, forwarded by the one who may
  let submittedWithFile: string; // section_review, whose file is on the record
  let recordFile: string;
  let closed: string;
  let withConditions: string;
  let condition: string;
  let evidence: string;
  let preview: { id: string; token: string };

  let cases = 0;
  let failures = 0;
  let leaks = 0;

  const origin = () => t.env.PUBLIC_URL;
  const versionOf = async (id: string) => (await t.db.select({ v: changeRequests.version }).from(changeRequests).where(eq(changeRequests.id, id)))[0]!.v;
  const upload = (agent: Agent, id: string, name: string, bytes: Buffer, purpose = 'revision') =>
    agent.post(`/api/requests/${id}/attachments?purpose=${purpose}`).set('origin', origin()).attach('files', bytes, name);

  // An open invitation made the way the service stores one, with a token this file knows.
  async function openInvitation(): Promise<{ id: string; token: string }> {
    const token = randomBytes(32).toString('base64url');
    const row = await t.db.transaction((tx) =>
      replaceOpenInvitation(tx, {
        email: `invited-${randomUUID().slice(0, 8)}@test.spanrelay.test`,
        name: 'Invited Inspector',
        role: 'field_inspector',
        organization: 'Marrowfield State Highway Department',
        projectIds: [s.otherProject.id],
        tokenHash: hashToken(token),
        invitedById: s.members.admin.id,
        expiresAt: new Date(Date.now() + invitationLifetimeMs),
      }),
    );
    return { id: row.id, token };
  }

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    const a = await agentsFor(t, s);
    const spareEmail = `spare-${randomUUID().slice(0, 8)}@test.spanrelay.test`;
    spare = { id: await upsertAccount(t.db, { email: spareEmail, name: 'Spare Person', role: 'contractor', organization: 'Corbel & Fane Constructors', password: testPassword }), email: spareEmail };

    callers = [{ label: 'signed out', agent: request.agent(t.app), person: null, role: null, member: false }];
    for (const role of roles) {
      callers.push({ label: `${role} (member)`, agent: a[role], person: s.members[role], role, member: true });
      callers.push({ label: `${role} (other project)`, agent: await signIn(t, s.outsiders[role].email), person: s.outsiders[role], role, member: false });
    }

    draft = (await requestAt(t, s, a, 'drafting')).id;
    photo = ((await upload(a.contractor, draft, 'pier-2-outlet.jpg', await samplePhoto())).body as { id: string }[])[0]!.id;
    draftFile = ((await upload(a.contractor, draft, 'drain-detail.jpg', await samplePhoto(40, 30))).body as { id: string }[])[0]!.id;
    review = (await requestAt(t, s, a, 'section_review')).id;
    moving = (await requestAt(t, s, a, 'section_review')).id;
    const withFile = await requestAt(t, s, a, 'drafting');
    submittedWithFile = withFile.id;
    recordFile = ((await upload(a.contractor, submittedWithFile, 'outlet-sketch.jpg', await samplePhoto())).body as { id: string }[])[0]!.id;
    const submitted = await a.contractor.post(`/api/requests/${submittedWithFile}/events`).set('origin', origin()).send({ version: withFile.version(), type: 'submit' });
    if (submitted.status !== 200) throw new Error(`submit answered ${submitted.status}: ${submitted.text}`);
    closed = (await requestAt(t, s, a, 'closed')).id;
    withConditions = (await requestAt(t, s, a, 'conditions_open')).id;
    condition = ((await a.field_inspector.get(`/api/requests/${withConditions}`)).body as { conditions: { id: string }[] }).conditions[0]!.id;
    evidence = ((await upload(a.field_inspector, withConditions, 'standby-pump.jpg', await samplePhoto(), 'condition_evidence')).body as { id: string }[])[0]!.id;
    preview = await openInvitation();
  });

  afterAll(async () => {
    recordReliability({
      category: 'access',
      cases,
      failures,
      lost: leaks,
      note: 'cells: every route × signed out × 7 roles × member or not of the project; CORS and own-role checks fail the file on their own',
    });
    await t?.close();
  });

  const get = (path: string) => (c: Caller) => c.agent.get(path).set('origin', origin());
  const send = (method: 'post' | 'put' | 'patch' | 'delete', path: string, body?: () => unknown) => async (c: Caller) => {
    const req = c.agent[method](path).set('origin', origin());
    return body ? req.send((await body()) as object) : req;
  };
  const dueDays = () => ({ deskDueDays: Object.fromEntries(deskRoles.map((d) => [d, 6])) });

  // Each row's path is a function so the ids made in beforeAll are read when the row runs.
  const rows = (): Row[] => [
    //                                                   contr sect  centr eor   field audit admin
    { name: 'health', route: 'GET /api/health', out: 200, member: everyone200, outsider: everyone200, call: get('/api/health') },
    // The development mail catcher: mounted only outside production, and read without signing in.
    { name: 'caught mail (development only)', route: 'GET /api/dev/mail', out: 200, member: everyone200, outsider: everyone200, call: get('/api/dev/mail') },
    // The invitation token is the credential; the caller's session does not matter.
    { name: 'invitation preview', route: 'POST /api/invitations/preview', out: 200, member: everyone200, outsider: everyone200,
      call: send('post', '/api/invitations/preview', () => ({ token: preview.token })) },
    { name: 'invitation accept', route: 'POST /api/invitations/accept', out: 201, member: [201, 201, 201, 201, 201, 201, 201], outsider: [201, 201, 201, 201, 201, 201, 201],
      call: async (c) => send('post', '/api/invitations/accept', async () => ({ token: (await openInvitation()).token, name: 'Invited Inspector', password: 'Girder-bearing-7731' }))(c) },

    // better-auth's own routes: sign-in, the session, sign-out, and the closed doors.
    { name: 'sign in', route: 'ALL /api/auth/*splat', out: 401, member: everyone200, outsider: everyone200,
      call: (c) => request(t.app).post('/api/auth/sign-in/email').set('origin', origin()).send({ email: c.person?.email ?? `nobody-${randomUUID().slice(0, 6)}@test.spanrelay.test`, password: testPassword }) },
    { name: 'session', route: 'ALL /api/auth/*splat', out: 200, member: everyone200, outsider: everyone200, call: get('/api/auth/get-session') },
    // Signing out without a session changes nothing, and says so with a 200.
    { name: 'sign out (a second session of the same person)', route: 'ALL /api/auth/*splat', out: 200, member: everyone200, outsider: everyone200,
      call: async (c) => {
        const agent = c.person ? await signIn(t, c.person.email) : request.agent(t.app);
        return agent.post('/api/auth/sign-out').set('origin', origin());
      } },
    { name: 'public sign-up is off', route: 'ALL /api/auth/*splat', out: 400, member: [400, 400, 400, 400, 400, 400, 400], outsider: [400, 400, 400, 400, 400, 400, 400],
      call: (c) => c.agent.post('/api/auth/sign-up/email').set('origin', origin()).send({ email: `walk-in-${randomUUID().slice(0, 6)}@test.spanrelay.test`, password: 'Walk-in-password-55', name: 'Walk In' }) },
    // The trail shows each mover's name, so nobody edits their own name, role or picture.
    { name: 'raising one’s own role through better-auth', route: 'ALL /api/auth/*splat', out: 401, member: [403, 403, 403, 403, 403, 403, 403], outsider: [403, 403, 403, 403, 403, 403, 403],
      call: send('post', '/api/auth/update-user', () => ({ role: 'admin' })) },
    { name: 'renaming oneself through better-auth', route: 'ALL /api/auth/*splat', out: 401, member: [403, 403, 403, 403, 403, 403, 403], outsider: [403, 403, 403, 403, 403, 403, 403],
      call: send('post', '/api/auth/update-user', () => ({ name: 'Chief Engineer' })) },

    { name: 'who am I', route: 'GET /api/me', out: 401, member: everyone200, outsider: everyone200, call: get('/api/me') },
    { name: 'my projects', route: 'GET /api/projects', out: 401, member: everyone200, outsider: everyone200, call: get('/api/projects'), shows: (res) => res.text.includes(s.project.id) },

    // The administrator's routes: refused to every other role before anything is read.
    { name: 'people', route: 'GET /api/admin/people', out: 401, member: adminOnly200, outsider: adminOnly200, call: get('/api/admin/people') },
    { name: 'change a person', route: 'PATCH /api/admin/people/:id', out: 401, member: adminOnly200, outsider: adminOnly200,
      call: (c) => send('patch', `/api/admin/people/${spare.id}`, () => ({ organization: 'Corbel & Fane Constructors' }))(c) },
    { name: 'raise oneself to administrator', route: 'PATCH /api/admin/people/:id', out: 401, member: [403, 403, 403, 403, 403, 403, 409], outsider: [403, 403, 403, 403, 403, 403, 409],
      call: (c) => send('patch', `/api/admin/people/${c.person?.id ?? spare.id}`, () => ({ role: c.role === 'admin' ? 'auditor' : 'admin' }))(c) },
    { name: 'projects (administration)', route: 'GET /api/admin/projects', out: 401, member: adminOnly200, outsider: adminOnly200, call: get('/api/admin/projects') },
    { name: 'due days', route: 'PATCH /api/admin/projects/:id', out: 401, member: adminOnly200, outsider: adminOnly200,
      call: (c) => send('patch', `/api/admin/projects/${s.otherProject.id}`, dueDays)(c) },
    { name: 'add a member', route: 'POST /api/admin/projects/:id/members', out: 401, member: adminOnly200, outsider: adminOnly200,
      call: (c) => send('post', `/api/admin/projects/${s.otherProject.id}/members`, () => ({ userId: spare.id }))(c) },
    { name: 'remove a member', route: 'DELETE /api/admin/projects/:id/members/:userId', out: 401, member: adminOnly200, outsider: adminOnly200,
      call: (c) => send('delete', `/api/admin/projects/${s.otherProject.id}/members/${spare.id}`)(c) },
    { name: 'open invitations', route: 'GET /api/admin/invitations', out: 401, member: adminOnly200, outsider: adminOnly200, call: get('/api/admin/invitations') },
    { name: 'invite', route: 'POST /api/admin/invitations', out: 401, member: adminOnly201, outsider: adminOnly201,
      call: send('post', '/api/admin/invitations', () => ({ email: `new-${randomUUID().slice(0, 8)}@test.spanrelay.test`, name: 'New Inspector', role: 'field_inspector', organization: '', projectIds: [s.otherProject.id] })) },
    { name: 'resend an invitation', route: 'POST /api/admin/invitations/:id/resend', out: 401, member: adminOnly200, outsider: adminOnly200,
      call: async (c) => send('post', `/api/admin/invitations/${(await openInvitation()).id}/resend`)(c) },
    { name: 'withdraw an invitation', route: 'DELETE /api/admin/invitations/:id', out: 401, member: adminOnly204, outsider: adminOnly204,
      call: async (c) => send('delete', `/api/admin/invitations/${(await openInvitation()).id}`)(c) },

    // Lists: each reader gets what they may see (the lists' contents are other files' concern).
    { name: 'trail search', route: 'GET /api/trail/search', out: 401, member: everyone200, outsider: everyone200, auditorSeesAll: true,
      call: (c) => get(`/api/trail/search?structure=${encodeURIComponent(s.project.structureNumber)}`)(c), shows: (res) => res.text.includes(s.project.id) },
    { name: 'conditions', route: 'GET /api/conditions', out: 401, member: everyone200, outsider: everyone200, auditorSeesAll: true,
      call: (c) => get(`/api/conditions?projectId=${s.project.id}`)(c), shows: (res) => res.text.includes(withConditions) },
    { name: 'register', route: 'GET /api/requests', out: 401, member: everyone200, outsider: everyone200, auditorSeesAll: true,
      call: (c) => get(`/api/requests?projectId=${s.project.id}`)(c), shows: (res) => res.text.includes(review) },
    { name: 'counts', route: 'GET /api/requests/counts', out: 401, member: everyone200, outsider: everyone200, auditorSeesAll: true,
      call: (c) => get(`/api/requests/counts?projectId=${s.project.id}`)(c), shows: (res) => (res.body as { total: number }).total > 0 },

    // One request and its files.
    { name: 'trail as CSV', route: 'GET /api/requests/:id/trail.csv', out: 401, member: readsMember, outsider: readsOutsider, call: (c) => get(`/api/requests/${review}/trail.csv`)(c) },
    { name: 'decision record', route: 'GET /api/requests/:id/decision-record.pdf', out: 401, member: readsMember, outsider: readsOutsider, call: (c) => get(`/api/requests/${review}/decision-record.pdf`)(c) },
    { name: 'the request', route: 'GET /api/requests/:id', out: 401, member: readsMember, outsider: readsOutsider, call: (c) => get(`/api/requests/${review}`)(c) },
    { name: 'trail check', route: 'GET /api/requests/:id/trail/verify', out: 401, member: readsMember, outsider: readsOutsider, call: (c) => get(`/api/requests/${review}/trail/verify`)(c) },
    { name: 'engineers of record to route to', route: 'GET /api/requests/:id/engineers-of-record', out: 401, member: readsMember, outsider: readsOutsider,
      call: (c) => get(`/api/requests/${review}/engineers-of-record`)(c) },
    { name: 'open a file', route: 'GET /api/attachments/:id/content', out: 401, member: readsMember, outsider: readsOutsider, call: (c) => get(`/api/attachments/${recordFile}/content`)(c) },
    { name: 'a photo’s preview', route: 'GET /api/attachments/:id/preview', out: 401, member: readsMember, outsider: readsOutsider, call: (c) => get(`/api/attachments/${recordFile}/preview`)(c) },
    // A draft is the contractor's until it is submitted; the auditor traces it from its start.
    { name: 'a draft', route: 'GET /api/requests/:id', out: 401, member: draftReadsMember, outsider: draftReadsOutsider, call: (c) => get(`/api/requests/${draft}`)(c) },
    { name: 'a draft’s trail as CSV', route: 'GET /api/requests/:id/trail.csv', out: 401, member: draftReadsMember, outsider: draftReadsOutsider, call: (c) => get(`/api/requests/${draft}/trail.csv`)(c) },
    { name: 'a draft’s file', route: 'GET /api/attachments/:id/content', out: 401, member: draftReadsMember, outsider: draftReadsOutsider, call: (c) => get(`/api/attachments/${photo}/content`)(c) },

    // Writing: the contractor files; the one desk holding the request moves it; members comment.
    { name: 'start a request', route: 'POST /api/requests', out: 401, member: [201, 403, 403, 403, 403, 403, 403], outsider: [404, 403, 403, 403, 403, 403, 403],
      call: (c) => send('post', '/api/requests', () => otherDeviationBody(s.project.id, 'Shift the scupper at pier 1'))(c) },
    { name: 'edit a draft', route: 'PUT /api/requests/:id/draft', out: 401, member: [200, 404, 404, 404, 404, 403, 404], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: (c) => send('put', `/api/requests/${draft}/draft`, async () => ({ version: await versionOf(draft), body: otherDeviationBody(s.project.id, 'Relocate drain outlet at pier 2, revised') }))(c) },
    { name: 'edit a request under review', route: 'PUT /api/requests/:id/draft', out: 401, member: [409, 403, 403, 403, 403, 403, 403], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: (c) => send('put', `/api/requests/${review}/draft`, async () => ({ version: await versionOf(review), body: otherDeviationBody(s.project.id) }))(c) },
    { name: 'forward from section review', route: 'POST /api/requests/:id/events', out: 401, member: [403, 200, 403, 403, 403, 403, 403], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: (c) => send('post', `/api/requests/${moving}/events`, async () => ({ version: await versionOf(moving), type: 'forward' }))(c) },
    { name: 'meet a condition on site', route: 'POST /api/requests/:id/events', out: 401, member: [403, 403, 403, 403, 200, 403, 403], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: (c) => send('post', `/api/requests/${withConditions}/events`, async () => ({ version: await versionOf(withConditions), type: 'satisfy_condition', conditionId: condition, evidenceAttachmentId: evidence, comment: 'Standby pump seen on site.' }))(c) },
    { name: 'withdraw a closed request', route: 'POST /api/requests/:id/events', out: 401, member: [409, 409, 409, 409, 409, 409, 409], outsider: [404, 404, 404, 404, 404, 409, 404],
      call: (c) => send('post', `/api/requests/${closed}/events`, async () => ({ version: await versionOf(closed), type: 'withdraw' }))(c) },
    { name: 'comment', route: 'POST /api/requests/:id/comments', out: 401, member: [201, 201, 201, 201, 201, 403, 201], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: (c) => send('post', `/api/requests/${review}/comments`, () => ({ comment: `Checked by ${c.label}.` }))(c) },
    { name: 'add a drawing to a draft', route: 'POST /api/requests/:id/attachments', out: 401, member: [201, 404, 404, 404, 404, 403, 404], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: async (c) => upload(c.agent, draft, 'scupper.jpg', await samplePhoto(24, 24)) },
    { name: 'add evidence while conditions are open', route: 'POST /api/requests/:id/attachments', out: 401, member: [403, 403, 403, 403, 201, 403, 403], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: async (c) => upload(c.agent, withConditions, 'trial-batch.jpg', await samplePhoto(24, 24), 'condition_evidence') },
    { name: 'add a drawing under review', route: 'POST /api/requests/:id/attachments', out: 401, member: [409, 403, 403, 403, 403, 403, 403], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: async (c) => upload(c.agent, review, 'late.jpg', await samplePhoto(24, 24)) },
    { name: 'remove a draft’s file', route: 'DELETE /api/requests/:id/attachments/:attachmentId', out: 401, member: [204, 404, 404, 404, 404, 403, 404], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: (c) => send('delete', `/api/requests/${draft}/attachments/${draftFile}`)(c) },
    { name: 'remove a file on the record', route: 'DELETE /api/requests/:id/attachments/:attachmentId', out: 401, member: [409, 403, 403, 403, 403, 403, 403], outsider: [404, 404, 404, 404, 404, 403, 404],
      call: (c) => send('delete', `/api/requests/${submittedWithFile}/attachments/${recordFile}`)(c) },
  ];


  // Every route the app declares, as "METHOD /path", read from Express 5's router stacks.
  function declaredRoutes(): string[] {
    const found: string[] = [];
    const walk = (stack: RouterLayer[], prefix: string) => {
      for (const layer of stack) {
        const path = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
        if (layer.route) {
          const methods = Object.keys(layer.route.methods).filter((m) => m !== '_all');
          // app.all() and route.all() declare every method Node knows.
          const all = layer.route.methods._all || ['get', 'post', 'put', 'patch', 'delete'].every((m) => methods.includes(m));
          for (const m of all ? ['all'] : methods) found.push(`${m.toUpperCase()} ${prefix}${layer.route.path}`);
        } else if (Array.isArray(layer.handle?.stack)) {
          walk(layer.handle.stack, prefix + path);
        }
      }
    };
    walk((t.app as unknown as { router: { stack: RouterLayer[] } }).router.stack, '');
    return found;
  }

  it('has a row for every route the app declares, and none for a route that is gone', () => {
    expect([...columns].sort(), 'a role without a column in the table').toEqual([...roles].sort());
    const declared = declaredRoutes();
    expect(declared.length).toBeGreaterThan(30);
    const listed = new Set(rows().map((r) => r.route));
    expect(declared.filter((r) => !listed.has(r)), 'routes without a row in the matrix').toEqual([]);
    expect([...listed].filter((r) => !declared.includes(r)), 'rows for routes the app no longer has').toEqual([]);
  });

  it('never lets a person raise their own role or rename themself, through better-auth or the administrator’s routes', async () => {
    for (const c of callers.filter((x) => x.role && x.role !== 'admin')) {
      const before = (await c.agent.get('/api/me')).body as { name: string };
      await c.agent.post('/api/auth/update-user').set('origin', origin()).send({ role: 'admin' });
      await c.agent.post('/api/auth/update-user').set('origin', origin()).send({ name: 'Chief Engineer', role: 'admin' });
      await c.agent.patch(`/api/admin/people/${c.person!.id}`).set('origin', origin()).send({ role: 'admin' });
      const me = await c.agent.get('/api/me');
      expect(me.status, c.label).toBe(200);
      expect((me.body as { role: string }).role, c.label).toBe(c.role);
      expect((me.body as { name: string }).name, c.label).toBe(before.name);
      const session = await c.agent.get('/api/auth/get-session');
      expect((session.body as { user: { role: string } }).user.role, c.label).toBe(c.role);
    }
  });

  it('grants no other site a CORS answer, on any route or its preflight', async () => {
    const foreign = 'https://elsewhere.example';
    const anyId = randomUUID();
    const granted: string[] = [];
    const paths = declaredRoutes().map((r) => {
      const [method, path] = r.split(' ') as [string, string];
      const concrete = path.replace('/*splat', '/get-session').replace(/:[A-Za-z]+/g, anyId);
      return { method: method === 'ALL' ? 'GET' : method, path: concrete };
    });
    const signedIn = callers.find((c) => c.role === 'admin' && c.member)!.agent;
    for (const { method, path } of paths) {
      for (const agent of [request(t.app), signedIn]) {
        const plain = await (agent as Agent)[method.toLowerCase() as 'get'](path).set('origin', foreign);
        const preflight = await (agent as Agent)
          .options(path)
          .set('origin', foreign)
          .set('access-control-request-method', method)
          .set('access-control-request-headers', 'content-type');
        for (const [kind, res] of [['call', plain], ['preflight', preflight]] as const) {
          const grants = Object.keys(res.headers).filter((h) => h.startsWith('access-control-allow'));
          if (grants.length) {
            granted.push(`${kind} ${method} ${path}: ${grants.join(', ')}`);
          }
        }
      }
    }
    expect(granted).toEqual([]);
  });

  function expected(row: Row, c: Caller): number {
    if (!c.role) return row.out;
    return (c.member ? row.member : row.outsider)[columns.indexOf(c.role)]!;
  }

  const ok = (status: number) => status >= 200 && status < 300;

  describe('each route, each caller', () => {
    // Names only: the rows' ids exist once beforeAll has run.
    const names = rows().map((r) => r.name);
    it.each(names)('%s', async (name) => {
      const row = rows().find((r) => r.name === name)!;
      // The one who may goes last, so the refusals meet the request as it was.
      const order = [...callers].sort((x, y) => Number(ok(expected(row, x))) - Number(ok(expected(row, y))));
      const wrong: string[] = [];
      for (const c of order) {
        const want = expected(row, c);
        const res = await row.call(c);
        cases += 1;
        if (res.status !== want) {
          failures += 1;
          wrong.push(`${c.label}: expected ${want}, got ${res.status} ${res.text.slice(0, 160)}`);
          if (want === 404 && ok(res.status)) leaks += 1;
        } else if (row.shows && c.role) {
          const shouldSee = c.member || (c.role === 'auditor' && row.auditorSeesAll === true);
          const sees = row.shows(res);
          if (sees !== shouldSee) {
            failures += 1;
            if (sees) leaks += 1;
            wrong.push(`${c.label}: ${sees ? 'shown' : 'not shown'} the project's data (${res.text.slice(0, 160)})`);
          }
        }
      }
      expect(wrong).toEqual([]);
    });
  });
});
