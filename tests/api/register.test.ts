// The register: filters, text search, longest-waiting-first order and cursor pages.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
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

  it('refuses unknown filters and cursors it did not give out', async () => {
    expect((await a.contractor.get('/api/requests?state=lost')).status).toBe(400);
    expect((await a.contractor.get('/api/requests?colour=red')).status).toBe(400);
    expect((await a.contractor.get('/api/requests?cursor=not-a-cursor')).status).toBe(400);
  });
});
