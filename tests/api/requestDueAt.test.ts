// The desks sort and count overdue work by change_requests.due_at, which a trigger keeps
// (drizzle/0004_request_due_at.sql). The screens show the due date that deskDueAt computes
// (shared/requests/deskClock.ts). Both must give the same answer for every state, with the default
// days and with a project's own days, and after an administrator changes those days.
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { eq, sql } from 'drizzle-orm';
import { changeRequests, projects } from '../../db/schema';
import { deskDueAt } from '../../shared/requests/deskClock';
import { requestStates } from '../../shared/requests/states';
import { defaultDeskDueDays, type DeskDueDays } from '../../shared/workflow/desks';
import { buildTestApp, createScenario, type TestApp } from '../support/apiHarness';

describe('due dates kept in the database', () => {
  let t: TestApp;
  let s: Awaited<ReturnType<typeof createScenario>>;
  // A desk_since on the day before a daylight-saving change in many zones: 24-hour days either way.
  const deskSince = new Date('2027-03-13T15:30:00.123Z');

  beforeAll(async () => {
    t = buildTestApp();
    s = await createScenario(t.db);
  });
  afterAll(() => t.close());

  async function fileOneInEachState(projectId: string) {
    const ids = new Map<string, string>();
    for (const state of requestStates) {
      const id = randomUUID();
      await t.db.insert(changeRequests).values({
        id,
        number: `DUE-${id.slice(0, 8)}`,
        projectId,
        type: 'other',
        title: `Due date in ${state}`,
        state,
        filedById: s.contractor.id,
        deskSince,
      });
      ids.set(state, id);
    }
    return ids;
  }

  async function dueAtOf(id: string): Promise<string> {
    const [row] = await t.db.select({ dueAt: sql<string>`${changeRequests.dueAt}::text` }).from(changeRequests).where(eq(changeRequests.id, id));
    return row!.dueAt;
  }

  // What the screens would show, as the database should hold it.
  function expected(state: string, days: Partial<DeskDueDays> | null): string {
    const due = deskDueAt(state, deskSince, days);
    return due ? due.toISOString() : 'infinity';
  }

  const asIso = (text: string) => (text === 'infinity' ? text : new Date(text).toISOString());

  it('matches deskDueAt in every state with the default days, and is infinity once settled', async () => {
    const ids = await fileOneInEachState(s.project.id);
    for (const [state, id] of ids) expect(asIso(await dueAtOf(id)), state).toBe(expected(state, defaultDeskDueDays));
    // The defaults themselves (shared/workflow/desks.ts): five days at the section engineer.
    expect(await dueAtOf(ids.get('section_review')!).then(asIso)).toBe('2027-03-18T15:30:00.123Z');
    expect(await dueAtOf(ids.get('closed')!)).toBe('infinity');
  });

  it("follows a move to another desk and a project's own desk days, old and new requests alike", async () => {
    const days: DeskDueDays = { contractor: 9, section_engineer: 2, central_office: 1, engineer_of_record: 21, field_inspector: 4 };
    const ids = await fileOneInEachState(s.otherProject.id);
    await t.db.update(projects).set({ deskDueDays: days }).where(eq(projects.id, s.otherProject.id));
    for (const [state, id] of ids) expect(asIso(await dueAtOf(id)), state).toBe(expected(state, days));

    const moved = ids.get('section_review')!;
    const arrived = new Date('2027-04-01T08:00:00Z');
    await t.db.update(changeRequests).set({ state: 'central_routing', deskSince: arrived }).where(eq(changeRequests.id, moved));
    expect(asIso(await dueAtOf(moved))).toBe(new Date(arrived.getTime() + 1 * 86_400_000).toISOString());

    const later = await fileOneInEachState(s.otherProject.id);
    for (const [state, id] of later) expect(asIso(await dueAtOf(id)), state).toBe(expected(state, days));
  });
});
