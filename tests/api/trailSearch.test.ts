// The auditor's trail: search by number, structure, person, dates and decision within what the
// reader may see; the trail as CSV that re-verifies on its own and cannot run as a formula; the
// decision record rendered on demand.
import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { genesisHash } from '../../shared/trail/canonicalJson';
import { buildTestApp, createScenario, signIn, type TestApp } from '../support/apiHarness';
import { binary, parseCsv, pdfText, unguard } from '../support/documents';
import { agentsFor, otherDeviationBody, requestAt } from '../support/requestFixtures';

type Agent = Awaited<ReturnType<typeof signIn>>;
type Hit = { id: string; number: string; title: string; state: string; decision: string | null; project: { id: string; structureNumber: string; name: string }; lastEventAt: string; events: number };

const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');
const hostileComments = [
  '=HYPERLINK("http://127.0.0.1/steal","Open, please")',
  '+1 pump on standby',
  '-4 days on the schedule',
  '@SUM(1,2)',
  "'quoted already",
  'Two lines:\nthe second says "pier 2", with a comma',
];

describe('trail search and export', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  let outsideAuditor: Agent;
  let outsideContractor: Agent;
  const ids = {} as Record<'approved' | 'conditions' | 'rejected' | 'open' | 'elsewhere', string>;
  const numbers = {} as Record<keyof typeof ids, string>;
  let lastBeforeOpen: string;

  const search = (agent: Agent, query: Record<string, string | number>) => agent.get('/api/trail/search').query(query);
  const hitsOf = async (agent: Agent, query: Record<string, string | number>): Promise<Hit[]> => {
    const res = await search(agent, { limit: 100, ...query });
    expect(res.status, res.text).toBe(200);
    return res.body.items;
  };
  const idsOf = (hits: Hit[]) => hits.map((h) => h.id).sort();
  const mine = (query: Record<string, string>) => hitsOf(a.auditor, { structure: s.project.structureNumber, ...query });

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    outsideAuditor = await signIn(t, s.outsiders.auditor.email);
    outsideContractor = await signIn(t, s.outsiders.contractor.email);
    ids.approved = (await requestAt(t, s, a, 'closed')).id;
    ids.conditions = (await requestAt(t, s, a, 'conditions_open')).id;
    ids.rejected = (await requestAt(t, s, a, 'rejected')).id;
    lastBeforeOpen = (await a.auditor.get(`/api/requests/${ids.rejected}`)).body.trail.at(-1).at;
    ids.open = (await requestAt(t, s, a, 'section_review')).id;
    for (const comment of hostileComments) {
      const res = await a.section_engineer.post(`/api/requests/${ids.open}/comments`).send({ comment });
      expect(res.status, res.text).toBe(201);
    }
    ids.elsewhere = (await outsideContractor.post('/api/requests').send(otherDeviationBody(s.otherProject.id, 'Shift bearing plate at abutment 1'))).body.id;
    for (const key of Object.keys(ids) as (keyof typeof ids)[]) {
      numbers[key] = (await outsideAuditor.get(`/api/requests/${ids[key]}`)).body.number;
    }
  });
  afterAll(() => t.close());

  it('finds by structure number, with the number, state, decision, last event time and event count of each', async () => {
    const hits = await mine({});
    expect(idsOf(hits)).toEqual([ids.approved, ids.conditions, ids.rejected, ids.open].sort());
    for (const hit of hits) {
      const detail = (await a.auditor.get(`/api/requests/${hit.id}`)).body;
      expect(hit).toEqual({
        id: detail.id,
        number: detail.number,
        title: detail.title,
        state: detail.state,
        decision: detail.decision,
        project: { id: s.project.id, code: s.project.code, name: s.project.name, structureNumber: s.project.structureNumber },
        lastEventAt: detail.trail.at(-1).at,
        events: detail.trail.length,
      });
    }
    // Most recent activity first.
    const times = hits.map((h) => h.lastEventAt);
    expect(times).toEqual([...times].sort().reverse());
    expect(idsOf(await hitsOf(a.auditor, { structure: s.otherProject.structureNumber }))).toEqual([ids.elsewhere]);
  });

  it('finds by request number, whole or in part', async () => {
    expect(idsOf(await hitsOf(a.auditor, { number: numbers.conditions }))).toEqual([ids.conditions]);
    expect(idsOf(await hitsOf(a.auditor, { number: numbers.rejected.toLowerCase() }))).toEqual([ids.rejected]);
    expect(idsOf(await hitsOf(a.auditor, { number: `${s.project.code}-` }))).toHaveLength(4);
  });

  it('finds by a name or e-mail of anyone who acted in the trail', async () => {
    const eor = s.members.engineer_of_record;
    expect(idsOf(await hitsOf(a.auditor, { person: eor.name }))).toEqual([ids.approved, ids.conditions, ids.rejected].sort());
    expect(idsOf(await hitsOf(a.auditor, { person: eor.email.toUpperCase() }))).toEqual([ids.approved, ids.conditions, ids.rejected].sort());
    expect(idsOf(await hitsOf(a.auditor, { person: s.members.section_engineer.email }))).toEqual([ids.approved, ids.conditions, ids.rejected, ids.open].sort());
    // Members who never acted are in no trail.
    expect(await hitsOf(a.auditor, { person: s.members.field_inspector.email })).toEqual([]);
    expect(await hitsOf(a.auditor, { person: s.secondEor.name })).toEqual([]);
  });

  it('finds by the dates of trail events: whole days, or to the millisecond', async () => {
    const day = lastBeforeOpen.slice(0, 10);
    const dayAfter = new Date(Date.parse(day) + 86_400_000).toISOString().slice(0, 10);
    const dayBefore = new Date(Date.parse(day) - 86_400_000).toISOString().slice(0, 10);
    expect(await mine({ from: day, to: day })).toHaveLength(4);
    expect(await mine({ from: dayAfter })).toEqual([]);
    expect(await mine({ to: dayBefore })).toEqual([]);
    const justAfter = new Date(Date.parse(lastBeforeOpen) + 1).toISOString();
    expect(idsOf(await mine({ from: justAfter }))).toEqual([ids.open]);
    // Every event of the first three requests is at or before that moment; the open one started after.
    expect(idsOf(await mine({ to: lastBeforeOpen }))).toEqual([ids.approved, ids.conditions, ids.rejected].sort());
  });

  it('finds by decision, and undecided for requests not decided yet', async () => {
    expect(idsOf(await mine({ decision: 'approved' }))).toEqual([ids.approved]);
    expect(idsOf(await mine({ decision: 'approved_with_conditions' }))).toEqual([ids.conditions]);
    expect(idsOf(await mine({ decision: 'rejected' }))).toEqual([ids.rejected]);
    expect(idsOf(await mine({ decision: 'undecided' }))).toEqual([ids.open]);
    // Filters combine: the engineer of record acted in no undecided request.
    expect(await mine({ decision: 'undecided', person: s.members.engineer_of_record.email })).toEqual([]);
  });

  it('pages with a cursor, every hit once, in order', async () => {
    const seen: Hit[] = [];
    let cursor: string | undefined;
    for (let page = 0; page < 5; page++) {
      const res = await search(a.auditor, { structure: s.project.structureNumber, limit: 3, ...(cursor ? { cursor } : {}) });
      expect(res.status, res.text).toBe(200);
      seen.push(...res.body.items);
      cursor = res.body.nextCursor ?? undefined;
      if (!cursor) break;
    }
    expect(seen.map((h) => h.id)).toEqual((await mine({})).map((h) => h.id));
    expect(new Set(seen.map((h) => h.id)).size).toBe(4);
    expect(cursor).toBeUndefined();
  });

  it('shows others only the requests of their own projects', async () => {
    const contractorHits = await hitsOf(a.contractor, {});
    expect(contractorHits.length).toBeGreaterThanOrEqual(4);
    expect(contractorHits.every((h) => h.project.id === s.project.id)).toBe(true);
    expect(await hitsOf(a.contractor, { number: numbers.elsewhere })).toEqual([]);
    expect(idsOf(await hitsOf(outsideContractor, { person: s.outsiders.contractor.email }))).toEqual([ids.elsewhere]);
    expect(await hitsOf(outsideContractor, { structure: s.project.structureNumber })).toEqual([]);
    // An auditor on no project of theirs still traces every request.
    expect(idsOf(await hitsOf(outsideAuditor, { number: numbers.approved }))).toEqual([ids.approved]);
  });

  it('refuses a bad query with 400 and names the fields', async () => {
    const cases: [Record<string, string>, string][] = [
      [{ from: '2026-13-01' }, 'from'],
      [{ to: '2027-02-30' }, 'to'],
      [{ from: 'last tuesday' }, 'from'],
      [{ from: '2026-06-02', to: '2026-06-01' }, 'to'],
      [{ from: '2026-06-01T12:00:00.001Z', to: '2026-06-01T12:00:00.000Z' }, 'to'],
      [{ decision: 'maybe' }, 'decision'],
      [{ person: 'a' }, 'person'],
      [{ number: '   ' }, 'number'],
      [{ limit: '0' }, 'limit'],
      [{ colour: 'blue' }, 'colour'],
    ];
    for (const [query, field] of cases) {
      const res = await search(a.auditor, query);
      expect(res.status, JSON.stringify(query)).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(Object.keys(res.body.error.fields ?? {}), JSON.stringify(query)).toContain(field);
    }
    const badCursor = await search(a.auditor, { cursor: 'not-a-cursor' });
    expect(badCursor.status).toBe(400);
    expect(badCursor.body.error.code).toBe('bad_cursor');
    // The same day at both ends is a range of one day.
    expect((await search(a.auditor, { from: '2026-06-01', to: '2026-06-01' })).status).toBe(200);
  });

  it('exports the trail as CSV whose hashes re-verify the chain and whose cells cannot run as formulas', async () => {
    for (const id of [ids.open, ids.conditions]) {
      const res = await a.auditor.get(`/api/requests/${id}/trail.csv`).buffer(true);
      expect(res.status, res.text).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
      const number = id === ids.open ? numbers.open : numbers.conditions;
      expect(res.headers['content-disposition']).toBe(`attachment; filename="${number}-trail.csv"`);
      const [header, ...rows] = parseCsv(res.text);
      expect(header).toEqual(['seq', 'at', 'actor_name', 'actor_organization', 'actor_role', 'event', 'state_before', 'state_after', 'comment', 'prev_hash', 'hash', 'hashed_event']);
      const trail = (await a.auditor.get(`/api/requests/${id}`)).body.trail;
      expect(rows).toHaveLength(trail.length);
      let prev = genesisHash;
      rows.forEach((row, i) => {
        const [seq, at, actorName, , role, event, before, after, comment, prevHash, hash, hashedEvent] = row as string[];
        // Recomputed here as server/trail/trailChain.ts does: SHA-256(previous hash ‖ canonical JSON).
        expect(prevHash).toBe(prev);
        expect(sha256(prevHash! + hashedEvent!)).toBe(hash);
        const hashed = JSON.parse(hashedEvent!);
        expect(hashed).toMatchObject({ requestId: id, seq: Number(seq), createdAt: at, actorRole: role, eventType: event, stateBefore: before || null, stateAfter: after });
        expect(comment === '' ? null : unguard(comment!)).toBe(hashed.comment);
        expect({ seq: Number(seq), at, actorName, hash }).toEqual({ seq: trail[i].seq, at: trail[i].at, actorName: trail[i].actor.name, hash: trail[i].hash });
        prev = hash!;
      });
    }

    const res = await a.auditor.get(`/api/requests/${ids.open}/trail.csv`).buffer(true);
    const comments = parseCsv(res.text).slice(1).map((row) => row[8]);
    expect(comments.slice(-hostileComments.length)).toEqual([
      `'${hostileComments[0]}`,
      `'${hostileComments[1]}`,
      `'${hostileComments[2]}`,
      `'${hostileComments[3]}`,
      `''quoted already`,
      hostileComments[5],
    ]);
    // Exact cells in the file: quotes doubled inside a quoted cell, the newline kept inside it.
    expect(res.text).toContain(`,"'=HYPERLINK(""http://127.0.0.1/steal"",""Open, please"")",`);
    expect(res.text).toContain(`,"Two lines:\nthe second says ""pier 2"", with a comma",`);
    // No cell of any record starts a formula.
    for (const row of parseCsv(res.text)) for (const cell of row) expect(cell).not.toMatch(/^[=+\-@]/);
  });

  it('renders the decision record on demand, decided or not', async () => {
    const decided = await a.auditor.get(`/api/requests/${ids.approved}/decision-record.pdf`).buffer(true).parse(binary);
    expect(decided.status).toBe(200);
    expect(decided.headers['content-type']).toBe('application/pdf');
    expect(decided.headers['content-disposition']).toBe(`attachment; filename="${numbers.approved}-decision-record.pdf"`);
    const decidedPdf = decided.body as Buffer;
    expect(decidedPdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const decidedText = await pdfText(decidedPdf);
    expect(decidedText).toContain(`Decision record ${numbers.approved}`);
    expect(decidedText).toContain('Decision: Approved');
    expect(decidedText).toMatch(/intact, \d+ events/);

    const open = await a.contractor.get(`/api/requests/${ids.open}/decision-record.pdf`).buffer(true).parse(binary);
    expect(open.status).toBe(200);
    const openText = await pdfText(open.body as Buffer);
    expect(openText).toContain(`Decision record ${numbers.open}`);
    expect(openText).toContain('Decision: none yet');
    const openTrail = (await a.contractor.get(`/api/requests/${ids.open}`)).body.trail;
    expect(openText).toContain(openTrail.at(-1).hash);
  });

  it('answers 404 for a request of another project, and for an id that is no request', async () => {
    for (const path of ['trail.csv', 'decision-record.pdf']) {
      const other = await outsideContractor.get(`/api/requests/${ids.approved}/${path}`);
      expect(other.status, path).toBe(404);
      expect(other.body.error.code).toBe('request_not_found');
      expect((await a.contractor.get(`/api/requests/${ids.elsewhere}/${path}`)).status).toBe(404);
      expect((await a.auditor.get(`/api/requests/00000000-0000-4000-8000-000000000000/${path}`)).status).toBe(404);
      expect((await a.auditor.get(`/api/requests/not-an-id/${path}`)).status).toBe(404);
      expect((await outsideAuditor.get(`/api/requests/${ids.approved}/${path}`)).status).toBe(200);
    }
  });
});
