// The register: filters, text search, longest-waiting-first order and cursor pages.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq } from 'drizzle-orm';
import { changeRequests } from '../../db/schema';
import { buildTestApp, createScenario, signIn, type TestApp } from '../support/apiHarness';
import { agentsFor, deckPlacementBody, requestAt } from '../support/requestFixtures';

describe('GET /api/requests', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;
  const ids: Record<string, string> = {};
  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    for (const state of ['section_review', 'section_review', 'central_routing', 'eor_review', 'drafting', 'closed', 'section_review'] as const) {
      const r = await requestAt(t, s, a, state);
      ids[`${state}-${Object.keys(ids).length}`] = r.id;
    }
    const deck = await a.contractor.post('/api/requests').send(deckPlacementBody(s.project.id));
    ids.deck = deck.body.id;
  });
  afterAll(() => t.close());

  const page = async (agent: (typeof a)[keyof typeof a], query: string) => {
    const res = await agent.get(`/api/requests?${query}`);
    expect(res.status, res.text).toBe(200);
    return res.body as { items: { id: string; state: string; type: string; deskSince: string; title: string }[]; nextCursor: string | null };
  };

  it('pages through every visible request once, longest waiting first', async () => {
    const seen: { id: string; deskSince: string }[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const p = await page(a.auditor, `projectId=${s.project.id}&limit=3${cursor ? `&cursor=${cursor}` : ''}`);
      seen.push(...p.items);
      cursor = p.nextCursor;
      pages += 1;
    } while (cursor);
    expect(pages).toBe(3);
    expect(seen.map((r) => r.id).sort()).toEqual(Object.values(ids).sort());
    const times = seen.map((r) => r.deskSince);
    expect(times).toEqual([...times].sort());
  });

  it('shows each desk what waits for it', async () => {
    const engineer = await page(a.section_engineer, 'desk=mine');
    expect(engineer.items).toHaveLength(3);
    expect(engineer.items.every((r) => r.state === 'section_review')).toBe(true);
    const eor = await page(a.engineer_of_record, 'desk=mine');
    expect(eor.items.map((r) => r.state)).toEqual(['eor_review']);
    // The second engineer of record has nothing routed to them.
    const other = await page(await signIn(t, s.secondEor.email), 'desk=mine');
    expect(other.items).toEqual([]);
  });

  it('filters by state, type and text', async () => {
    expect((await page(a.contractor, 'state=central_routing')).items.map((r) => r.id)).toEqual([ids['central_routing-2']]);
    expect((await page(a.contractor, 'type=deck_placement_change')).items.map((r) => r.id)).toEqual([ids.deck]);
    expect((await page(a.contractor, 'q=three-span')).items.map((r) => r.id)).toEqual([ids.deck]);
    // LIKE wildcards in the search text are taken literally.
    expect((await page(a.contractor, `q=${encodeURIComponent('%')}`)).items).toEqual([]);
  });

  it('keeps the desk clock from the trail: the time of the event that put it on its desk', async () => {
    const detail = (await a.auditor.get(`/api/requests/${ids['eor_review-3']}`)).body;
    const lastMove = detail.trail.filter((e: { stateBefore: string | null; stateAfter: string }) => e.stateBefore !== e.stateAfter).at(-1);
    expect(detail.deskSince).toBe(lastMove.at);
  });

  it('puts overdue requests first when sorted by due date, each with its desk and due date', async () => {
    // A request that reached the section engineer ten days ago is past the project's five days
    // (the default due days of shared/workflow/desks.ts).
    const late = ids['section_review-6']!;
    await t.db.update(changeRequests).set({ deskSince: new Date(Date.now() - 10 * 24 * 3600 * 1000) }).where(eq(changeRequests.id, late));
    const desk = await page(a.section_engineer, 'desk=mine&sort=due');
    expect(desk.items[0]!.id).toBe(late);
    const first = desk.items[0] as unknown as { desk: string; dueAt: string; overdue: boolean; deskSince: string };
    expect(first).toMatchObject({ desk: 'section_engineer', overdue: true });
    expect(new Date(first.dueAt).getTime() - new Date(first.deskSince).getTime()).toBe(5 * 24 * 3600 * 1000);
    expect(desk.items.slice(1).every((r) => !(r as unknown as { overdue: boolean }).overdue)).toBe(true);
    const dues = desk.items.map((r) => (r as unknown as { dueAt: string }).dueAt);
    expect(dues).toEqual([...dues].sort());
    // Settled requests have no desk and no due date, and come after every waiting one.
    const all = await page(a.auditor, `projectId=${s.project.id}&sort=due&limit=100`);
    const closed = all.items.find((r) => r.id === ids['closed-5']) as unknown as { desk: null; dueAt: null; overdue: boolean };
    expect(closed).toMatchObject({ desk: null, dueAt: null, overdue: false });
    expect(all.items.at(-1)!.id).toBe(ids['closed-5']);
  });

  it('pages every sort without repeating or skipping a request', async () => {
    for (const sort of ['due', 'waiting', 'newest', 'updated']) {
      const seen: string[] = [];
      let cursor: string | null = null;
      do {
        const p = await page(a.auditor, `projectId=${s.project.id}&sort=${sort}&limit=2${cursor ? `&cursor=${cursor}` : ''}`);
        seen.push(...p.items.map((r) => r.id));
        cursor = p.nextCursor;
      } while (cursor);
      expect(seen.sort(), sort).toEqual(Object.values(ids).sort());
    }
    const newest = await page(a.auditor, `projectId=${s.project.id}&sort=newest&limit=100`);
    const created = newest.items.map((r) => (r as unknown as { createdAt: string }).createdAt);
    expect(created).toEqual([...created].sort().reverse());
  });

  it('filters by the desk a request sits at', async () => {
    const central = await page(a.auditor, `projectId=${s.project.id}&atDesk=central_office`);
    expect(central.items.map((r) => r.id)).toEqual([ids['central_routing-2']]);
    const settled = await page(a.auditor, `projectId=${s.project.id}&atDesk=settled`);
    expect(settled.items.map((r) => r.id)).toEqual([ids['closed-5']]);
    // Drafts are at the contractor's desk; the deck draft and the drafting one.
    const contractor = await page(a.auditor, `projectId=${s.project.id}&atDesk=contractor`);
    expect(contractor.items.map((r) => r.id).sort()).toEqual([ids['drafting-4'], ids.deck].sort());
  });

  it('counts the matching requests per state, and the overdue ones', async () => {
    const res = await a.auditor.get(`/api/requests/counts?projectId=${s.project.id}`);
    expect(res.status, res.text).toBe(200);
    expect(res.body).toEqual({
      total: 8,
      overdue: 1,
      byState: { section_review: 3, central_routing: 1, eor_review: 1, drafting: 2, closed: 1 },
    });
    const mine = await a.section_engineer.get('/api/requests/counts?desk=mine');
    expect(mine.body).toEqual({ total: 3, overdue: 1, byState: { section_review: 3 } });
    expect((await a.section_engineer.get('/api/requests/counts?atDesk=nowhere')).status).toBe(400);
    expect((await a.section_engineer.get('/api/requests/counts?cursor=x')).status).toBe(400);
  });

  it('keeps drafts from the agency’s desks until they are submitted, in lists, counts and trail search alike', async () => {
    const drafts = [ids['drafting-4']!, ids.deck!];
    const listed = async (agent: (typeof a)[keyof typeof a]) => (await page(agent, `projectId=${s.project.id}&limit=50`)).items.map((r) => r.id);
    for (const desk of ['section_engineer', 'central_office', 'engineer_of_record', 'field_inspector', 'admin'] as const) {
      const seen = await listed(a[desk]);
      expect(seen, desk).toHaveLength(6);
      expect(seen.some((id) => drafts.includes(id)), desk).toBe(false);
      const counts = await a[desk].get(`/api/requests/counts?projectId=${s.project.id}`);
      expect(counts.body.byState.drafting, desk).toBeUndefined();
      const trail = await a[desk].get(`/api/trail/search?structure=${encodeURIComponent(s.project.structureNumber)}&limit=50`);
      expect(trail.status, trail.text).toBe(200);
      expect(drafts.some((id) => trail.text.includes(id)), desk).toBe(false);
    }
    expect(await listed(a.contractor)).toEqual(expect.arrayContaining(drafts));
    const auditorTrail = await a.auditor.get(`/api/trail/search?structure=${encodeURIComponent(s.project.structureNumber)}&limit=50`);
    expect(drafts.every((id) => auditorTrail.text.includes(id))).toBe(true);
  });

  it('refuses unknown filters and cursors it did not give out', async () => {
    expect((await a.contractor.get('/api/requests?state=lost')).status).toBe(400);
    expect((await a.contractor.get('/api/requests?colour=red')).status).toBe(400);
    expect((await a.contractor.get('/api/requests?cursor=not-a-cursor')).status).toBe(400);
    expect((await a.contractor.get('/api/requests?sort=sideways')).status).toBe(400);
    const forged = Buffer.from(JSON.stringify(['yesterday', 'x'])).toString('base64url');
    expect((await a.contractor.get(`/api/requests?cursor=${forged}`)).status).toBe(400);
  });
});
