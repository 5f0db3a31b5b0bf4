// The administrator's people-and-projects calls against the real app: refusals for every other
// role, role and membership changes, and an invitation from the mail the SMTP catcher received
// to the first sign-in of the new account.
import request from 'supertest';
import { createHash, randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitations } from '../../db/schema';
import { roles } from '../../shared/roles';
import { buildTestApp, createScenario, signIn, waitForMail, type TestApp } from '../support/apiHarness';

type Agent = Awaited<ReturnType<typeof signIn>>;
type Scenario = Awaited<ReturnType<typeof createScenario>>;

const tokenIn = (text: string, publicUrl: string) => {
  const match = text.match(new RegExp(`${publicUrl.replace(/[.:/]/g, '\\$&')}/accept-invitation\\?token=([A-Za-z0-9_-]+)`));
  if (!match) throw new Error(`no invitation link in: ${text}`);
  return match[1]!;
};

describe('people and projects, for administrators only', () => {
  let t: TestApp;
  let s: Scenario;
  let admin: Agent;
  const tag = randomUUID().slice(0, 8);
  const origin = () => ({ origin: t.env.PUBLIC_URL });

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    admin = await signIn(t, s.members.admin.email);
  });
  afterAll(() => t.close());

  const invite = (body: Record<string, unknown>) => admin.post('/api/admin/invitations').set(origin()).send(body);
  const accept = (body: Record<string, unknown>) => request(t.app).post('/api/invitations/accept').set(origin()).send(body);

  it('refuses every administrator call to every other role, and to nobody signed in', async () => {
    const calls: [method: 'get' | 'post' | 'patch' | 'delete', path: string, body?: object][] = [
      ['get', '/api/admin/people'],
      ['patch', `/api/admin/people/${s.members.contractor.id}`, { role: 'admin' }],
      ['get', '/api/admin/projects'],
      ['patch', `/api/admin/projects/${s.project.id}`, { deskDueDays: { contractor: 1, section_engineer: 1, central_office: 1, engineer_of_record: 1, field_inspector: 1 } }],
      ['post', `/api/admin/projects/${s.project.id}/members`, { userId: s.outsider.id }],
      ['delete', `/api/admin/projects/${s.project.id}/members/${s.contractor.id}`],
      ['get', '/api/admin/invitations'],
      ['post', '/api/admin/invitations', { email: `sneak-${tag}@test.spanrelay.test`, name: 'Sneak', role: 'admin', organization: '', projectIds: [] }],
      ['post', `/api/admin/invitations/${randomUUID()}/resend`],
      ['delete', `/api/admin/invitations/${randomUUID()}`],
    ];
    for (const role of roles.filter((r) => r !== 'admin')) {
      const agent = await signIn(t, s.members[role].email);
      for (const [method, path, body] of calls) {
        const res = await agent[method](path).set(origin()).send(body);
        expect(res.status, `${role} ${method} ${path}`).toBe(403);
        expect(res.body.error.code).toBe('admin_only');
      }
      // Not even their own role.
      const own = await agent.patch(`/api/admin/people/${s.members[role].id}`).set(origin()).send({ role: 'admin' });
      expect(own.status).toBe(403);
      expect((await agent.get('/api/me')).body.role).toBe(role);
    }
    for (const [method, path, body] of calls) {
      const res = await request(t.app)[method](path).set(origin()).send(body);
      expect(res.status, `signed out ${method} ${path}`).toBe(401);
    }
    const stored = await t.db.select().from(invitations).where(eq(invitations.email, `sneak-${tag}@test.spanrelay.test`));
    expect(stored).toHaveLength(0);
  });

  it('lists people with role, organization and projects', async () => {
    const res = await admin.get('/api/admin/people');
    expect(res.status).toBe(200);
    const engineer = res.body.find((p: { id: string }) => p.id === s.sectionEngineer.id);
    expect(engineer).toMatchObject({
      email: s.sectionEngineer.email,
      role: 'section_engineer',
      organization: 'section-engineer org',
      projects: [{ id: s.project.id, code: s.project.code, name: s.project.name }],
    });
  });

  it('changes a role and organization, effective on the next call of a session already open', async () => {
    const person = s.outsiders.field_inspector;
    const theirs = await signIn(t, person.email);
    expect((await theirs.get('/api/me')).body.role).toBe('field_inspector');

    const res = await admin.patch(`/api/admin/people/${person.id}`).set(origin()).send({ role: 'auditor', organization: '  Internal Review  ' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: person.id, role: 'auditor', organization: 'Internal Review' });
    expect((await theirs.get('/api/me')).body).toMatchObject({ role: 'auditor', organization: 'Internal Review' });

    const cleared = await admin.patch(`/api/admin/people/${person.id}`).set(origin()).send({ organization: '' });
    expect(cleared.body.organization).toBeNull();
  });

  it('refuses a made-up role, unknown fields, an empty change and an unknown person', async () => {
    const id = s.outsiders.contractor.id;
    const bad = await admin.patch(`/api/admin/people/${id}`).set(origin()).send({ role: 'superuser' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.role).toBe('Choose one of the roles.');
    const extra = await admin.patch(`/api/admin/people/${id}`).set(origin()).send({ role: 'auditor', email: 'x@y.test' });
    expect(extra.status).toBe(400);
    expect(extra.body.error.fields.email).toBe('This field is not accepted here.');
    expect((await admin.patch(`/api/admin/people/${id}`).set(origin()).send({})).status).toBe(400);
    expect((await admin.patch(`/api/admin/people/${randomUUID()}`).set(origin()).send({ role: 'auditor' })).status).toBe(404);
    const unchanged = (await admin.get('/api/admin/people')).body.find((p: { id: string }) => p.id === id);
    expect(unchanged.role).toBe('contractor');
  });

  it('does not let an administrator change their own role', async () => {
    const res = await admin.patch(`/api/admin/people/${s.members.admin.id}`).set(origin()).send({ role: 'auditor' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('own_role');
    expect((await admin.get('/api/me')).body.role).toBe('admin');
  });

  it('adds and removes a project member, which decides what the person sees', async () => {
    const person = s.outsiders.section_engineer;
    const theirs = await signIn(t, person.email);
    const seen = async () => (await theirs.get('/api/projects')).body.map((p: { id: string }) => p.id);
    expect(await seen()).not.toContain(s.project.id);

    const added = await admin.post(`/api/admin/projects/${s.project.id}/members`).set(origin()).send({ userId: person.id });
    expect(added.status).toBe(200);
    expect(added.body.members.map((m: { id: string }) => m.id)).toContain(person.id);
    expect(await seen()).toContain(s.project.id);
    // Adding twice changes nothing.
    expect((await admin.post(`/api/admin/projects/${s.project.id}/members`).set(origin()).send({ userId: person.id })).status).toBe(200);

    const removed = await admin.delete(`/api/admin/projects/${s.project.id}/members/${person.id}`).set(origin());
    expect(removed.status).toBe(200);
    expect(removed.body.members.map((m: { id: string }) => m.id)).not.toContain(person.id);
    expect(await seen()).not.toContain(s.project.id);

    expect((await admin.post(`/api/admin/projects/${s.project.id}/members`).set(origin()).send({ userId: 'nobody' })).status).toBe(404);
    expect((await admin.post(`/api/admin/projects/${randomUUID()}/members`).set(origin()).send({ userId: person.id })).status).toBe(404);
  });

  it('saves each desk’s due days and refuses days out of range or a desk left out', async () => {
    const deskDueDays = { contractor: 10, section_engineer: 2, central_office: 4, engineer_of_record: 12, field_inspector: 3 };
    const res = await admin.patch(`/api/admin/projects/${s.project.id}`).set(origin()).send({ deskDueDays });
    expect(res.status).toBe(200);
    expect(res.body.deskDueDays).toEqual(deskDueDays);
    const listed = (await admin.get('/api/admin/projects')).body.find((p: { id: string }) => p.id === s.project.id);
    expect(listed.deskDueDays).toEqual(deskDueDays);

    const zero = await admin.patch(`/api/admin/projects/${s.project.id}`).set(origin()).send({ deskDueDays: { ...deskDueDays, central_office: 0 } });
    expect(zero.status).toBe(400);
    expect(zero.body.error.fields['deskDueDays.central_office']).toBe('At least 1 day.');
    const { field_inspector: _left, ...missing } = deskDueDays;
    const short = await admin.patch(`/api/admin/projects/${s.project.id}`).set(origin()).send({ deskDueDays: missing });
    expect(short.status).toBe(400);
    expect(short.body.error.fields['deskDueDays.field_inspector']).toBeDefined();
    expect((await admin.get('/api/admin/projects')).body.find((p: { id: string }) => p.id === s.project.id).deskDueDays).toEqual(deskDueDays);
  });

  it('invites by e-mail; the link makes the account once, with the role and projects granted', async () => {
    const email = `marta.quill-${tag}@test.spanrelay.test`;
    const sent = await invite({ email: email.toUpperCase(), name: 'Marta Quill', role: 'field_inspector', organization: 'Tallis Section', projectIds: [s.project.id] });
    expect(sent.status).toBe(201);
    expect(sent.body).toMatchObject({ email, role: 'field_inspector', expired: false, projects: [{ id: s.project.id }] });
    expect(Date.parse(sent.body.expiresAt) - Date.now()).toBeGreaterThan(6.9 * 24 * 3600 * 1000);

    const [mail] = await waitForMail(t.env, email);
    expect(mail?.subject).toBe('You are invited to Spanrelay');
    const token = tokenIn(mail!.text, t.env.PUBLIC_URL);
    expect(mail!.text).toContain('Field inspector, Tallis Section');

    // Only the hash is kept.
    const [row] = await t.db.select().from(invitations).where(eq(invitations.email, email));
    expect(row!.tokenHash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(row)).not.toContain(token);
    expect((await admin.get('/api/admin/invitations')).body.map((i: { email: string }) => i.email)).toContain(email);

    const preview = await request(t.app).post('/api/invitations/preview').set(origin()).send({ token });
    expect(preview.status).toBe(200);
    expect(preview.body).toEqual({ email, name: 'Marta Quill', role: 'field_inspector', organization: 'Tallis Section', projects: [`${s.project.code} ${s.project.name}`] });

    const short = await accept({ token, name: 'Marta Quill', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.fields.password).toBe('Use at least 10 characters.');
    const nameInIt = await accept({ token, name: 'Marta Quill', password: `My-${`marta.quill-${tag}`.toUpperCase()}-pw` });
    expect(nameInIt.status).toBe(400);
    expect(nameInIt.body.error.fields.password).toMatch(/name part of your e-mail/);
    // A role cannot be slipped in at acceptance.
    const slipped = await accept({ token, name: 'Marta Quill', password: 'pier cap 27 west', role: 'admin' });
    expect(slipped.status).toBe(400);

    const done = await accept({ token, name: 'Marta Quill, P.E.', password: 'pier cap 27 west' });
    expect(done.status).toBe(201);
    expect(done.body).toEqual({ email });

    const agent = request.agent(t.app);
    const signedIn = await agent.post('/api/auth/sign-in/email').set(origin()).send({ email, password: 'pier cap 27 west' });
    expect(signedIn.status).toBe(200);
    expect((await agent.get('/api/me')).body).toMatchObject({ email, name: 'Marta Quill, P.E.', role: 'field_inspector', organization: 'Tallis Section' });
    expect((await agent.get('/api/projects')).body.map((p: { id: string }) => p.id)).toEqual([s.project.id]);

    const again = await accept({ token, name: 'Someone Else', password: 'another long password' });
    expect(again.status).toBe(410);
    expect(again.body.error.code).toBe('invitation_used');
    const afterReuse = await request(t.app).post('/api/auth/sign-in/email').set(origin()).send({ email, password: 'another long password' });
    expect(afterReuse.status).toBe(401);
    expect((await admin.get('/api/admin/invitations')).body.map((i: { email: string }) => i.email)).not.toContain(email);

    const twice = await invite({ email, name: 'Marta Quill', role: 'auditor', organization: '', projectIds: [] });
    expect(twice.status).toBe(409);
    expect(twice.body.error.fields.email).toMatch(/already has an account/);
  });

  it('refuses an expired link, and a new link sent again replaces the old one', async () => {
    const email = `ivo.brandt-${tag}@test.spanrelay.test`;
    expect((await invite({ email, name: 'Ivo Brandt', role: 'contractor', organization: 'Corbel & Fane Constructors', projectIds: [] })).status).toBe(201);
    const first = tokenIn((await waitForMail(t.env, email))[0]!.text, t.env.PUBLIC_URL);
    await t.db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.email, email));

    const expired = await accept({ token: first, name: 'Ivo Brandt', password: 'deck pour sequence 3' });
    expect(expired.status).toBe(410);
    expect(expired.body.error.code).toBe('invitation_expired');
    const listed = (await admin.get('/api/admin/invitations')).body.find((i: { email: string }) => i.email === email);
    expect(listed.expired).toBe(true);

    const resent = await admin.post(`/api/admin/invitations/${listed.id}/resend`).set(origin());
    expect(resent.status).toBe(200);
    expect(resent.body.expired).toBe(false);
    await expect.poll(async () => (await waitForMail(t.env, email)).length).toBe(2);
    const second = tokenIn((await waitForMail(t.env, email)).map((m) => m.text).find((text) => !text.includes(first))!, t.env.PUBLIC_URL);
    expect(second).not.toBe(first);

    expect((await accept({ token: first, name: 'Ivo Brandt', password: 'deck pour sequence 3' })).status).toBe(404);
    expect((await accept({ token: second, name: 'Ivo Brandt', password: 'deck pour sequence 3' })).status).toBe(201);
  });

  it('withdraws an open invitation, after which its link is not valid', async () => {
    const email = `odile.marsh-${tag}@test.spanrelay.test`;
    const sent = await invite({ email, name: 'Odile Marsh', role: 'auditor', organization: '', projectIds: [] });
    const token = tokenIn((await waitForMail(t.env, email))[0]!.text, t.env.PUBLIC_URL);
    expect((await admin.delete(`/api/admin/invitations/${sent.body.id}`).set(origin())).status).toBe(204);
    const res = await accept({ token, name: 'Odile Marsh', password: 'abutment seat two' });
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('invitation_not_found');
  });

  it('names each field of a bad invitation', async () => {
    const res = await invite({ email: 'not-an-address', name: ' ', role: 'foreman', organization: '', projectIds: ['x'] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'name', 'projectIds.0', 'role']);
    const gone = await invite({ email: `late-${tag}@test.spanrelay.test`, name: 'Late', role: 'auditor', organization: '', projectIds: [randomUUID()] });
    expect(gone.status).toBe(400);
    expect(gone.body.error.fields.projectIds).toBeDefined();
  });
});
