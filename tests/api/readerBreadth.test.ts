// A list names the reader's projects in one of two SQL forms, chosen by how many projects they are
// on (server/requests/readerBreadth.ts). The choice is for speed only: both must give the same
// pages, cursors and counts, and the count must really switch the form.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { forgetAllSessions } from '../../server/auth/sessionCache';
import { forgetReaderBreadths, narrowReaderProjects, rememberProjectsOfReader } from '../../server/requests/readerBreadth';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';
import { agentsFor, requestAt } from '../support/requestFixtures';
import { withStatementCount } from '../support/statementCounter';

type Agent = Awaited<ReturnType<typeof agentsFor>>[keyof Awaited<ReturnType<typeof agentsFor>>];

describe("the reader's projects in a list query", () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  let a: Awaited<ReturnType<typeof agentsFor>>;

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
    a = await agentsFor(t, s);
    for (let i = 0; i < 5; i++) await requestAt(t, s, a, 'section_review');
    await requestAt(t, s, a, 'central_routing');
  });
  afterAll(() => {
    forgetReaderBreadths();
    return t.close();
  });

  // Every page of a list, following the cursors, with the SQL that named the projects.
  async function walk(agent: Agent, path: string, projects: number) {
    forgetAllSessions();
    rememberProjectsOfReader(s.sectionEngineer.id, projects);
    const pages: unknown[] = [];
    let cursor: string | null = null;
    const { texts } = await withStatementCount(async () => {
      do {
        const paged = !path.includes('/counts');
        const res = await agent.get(`${path}${paged ? '&limit=2' : ''}${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`);
        expect(res.status, res.text).toBe(200);
        pages.push(res.body.items ?? res.body);
        cursor = res.body.nextCursor ?? null;
      } while (cursor);
    });
    const naming = texts.filter((q) => q.includes('"project_members"'));
    return { pages, naming };
  }

  it.each([
    ['the desk, soonest due first', '/api/requests?desk=mine&sort=due'],
    ['the register, longest waiting first', '/api/requests?sort=waiting'],
    ['a text search', '/api/requests?q=At'],
    ['the counts', '/api/requests/counts?desk=mine'],
  ])('gives the same answer either way: %s', async (_what, path) => {
    const narrow = await walk(a.section_engineer, path, 1);
    const wide = await walk(a.section_engineer, path, narrowReaderProjects + 1);
    expect(narrow.pages).toEqual(wide.pages);
    // Not two empty answers: the section engineer's project is listed, or counted.
    expect(JSON.stringify(narrow.pages)).toMatch(path.includes('/counts') ? /"total":[1-9]/ : new RegExp(s.project.code));
    expect(narrow.naming.length).toBeGreaterThan(0);
    expect(narrow.naming.every((q) => q.includes('= any(array('))).toBe(true);
    expect(wide.naming.some((q) => q.includes('= any(array('))).toBe(false);
    expect(wide.naming.every((q) => q.includes(' in (select'))).toBe(true);
  });

  it('looks the count up once and then remembers it', async () => {
    forgetAllSessions();
    forgetReaderBreadths();
    const first = await withStatementCount(() => a.section_engineer.get('/api/requests?desk=mine'));
    const second = await withStatementCount(() => a.section_engineer.get('/api/requests?desk=mine'));
    const counting = (texts: string[]) => texts.filter((q) => q.includes('count(') && q.includes('"project_members"')).length;
    expect(counting(first.texts)).toBe(1);
    expect(counting(second.texts)).toBe(0);
  });
});
