// Overdue reminders: a request that has waited at a desk longer than the project's due period for
// that desk gets one reminder to the people at that desk, and one more for each further period.
import { eq, inArray } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { changeRequests, deskReminders, projects } from '../../db/schema';
import { requestStateInfo, requestStates, type RequestState } from '../../shared/requests/states';
import { stateLabel } from '../../shared/requests/states';
import { defaultDeskDueDays } from '../../shared/workflow/desks';
import { queueMail, type QueuedMail } from '../mail/mailQueue';
import { membersWithRole, userById } from '../requests/requestRepository';

const dayMs = 24 * 60 * 60 * 1000;
const waitingStates = requestStates.filter((s) => !requestStateInfo[s].settled);

export async function sendDeskReminders(db: Database, publicUrl: string, now: Date = new Date()): Promise<number> {
  const open = await db
    .select({ request: changeRequests, dueDays: projects.deskDueDays, projectName: projects.name })
    .from(changeRequests)
    .innerJoin(projects, eq(projects.id, changeRequests.projectId))
    .where(inArray(changeRequests.state, waitingStates));
  let sent = 0;
  for (const { request: r, dueDays, projectName } of open) {
    const desk = requestStateInfo[r.state as RequestState].desk;
    if (!desk) continue;
    const due = dueDays[desk] ?? defaultDeskDueDays[desk];
    const waitedDays = (now.getTime() - r.deskSince.getTime()) / dayMs;
    const period = Math.floor(waitedDays / due);
    if (period < 1) continue;
    sent += await db.transaction(async (tx) => {
      const [fresh] = await tx.insert(deskReminders).values({ requestId: r.id, deskSince: r.deskSince, period }).onConflictDoNothing().returning();
      if (!fresh) return 0;
      const people =
        desk === 'engineer_of_record'
          ? [await userById(tx, r.assignedEorId ?? '')].filter((u) => u !== null)
          : desk === 'contractor'
            ? [await userById(tx, r.filedById)].filter((u) => u !== null)
            : await membersWithRole(tx, r.projectId, desk);
      const mails: QueuedMail[] = people.map((p) => ({
        idempotencyKey: `reminder:${r.id}:${r.deskSince.toISOString()}:${period}:${p.email}`,
        to: p.email,
        requestId: r.id,
        subject: `${r.number} is overdue at your desk (${Math.floor(waitedDays)} days)`,
        text: [
          `Hello ${p.name},`,
          '',
          `Request ${r.number}, "${r.title}", on ${projectName} has been at your desk for ${Math.floor(waitedDays)} days; the project allows ${due}.`,
          `It is: ${stateLabel(r.state)}.`,
          '',
          `Please act on it, or tell ${desk === 'contractor' ? 'the section engineer' : desk === 'section_engineer' ? 'the contractor' : 'the contractor and the section engineer'} when you will.`,
          '',
          `Open the request: ${publicUrl}/requests/${r.id}`,
        ].join('\n'),
      }));
      return queueMail(tx, mails);
    });
  }
  return sent;
}
