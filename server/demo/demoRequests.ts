// A few requests of the invented scenario at different desks, so every demo sign-in has work.
import { count, eq } from 'drizzle-orm';
import type { Database } from '../../db/client';
import { changeRequests } from '../../db/schema';
import type { RequestBody } from '../../shared/requests/requestBody';
import type { Actor } from '../../shared/requests/types';
import type { Role } from '../../shared/roles';
import { createDraft } from '../requests/draftService';
import { requestRow } from '../requests/requestRepository';
import { applyEvent } from '../workflow/workflowService';
import type { WorkflowEventInput } from '../../shared/workflow/events';

type DistributiveOmit<T, K extends keyof never> = T extends unknown ? Omit<T, K> : never;

export async function seedDemoRequests(db: Database, projectId: string, people: Record<Role, Actor>, publicUrl: string): Promise<void> {
  const [existing] = await db.select({ n: count() }).from(changeRequests).where(eq(changeRequests.projectId, projectId));
  if ((existing?.n ?? 0) > 0) return;

  const common = { projectId, planSheets: ['S-6', 'S-7'], costImpact: { kind: 'none' as const }, contractTimeImpactDays: 0 };
  const deck: RequestBody = {
    ...common,
    type: 'deck_placement_change',
    title: 'Place the three-span deck in one continuous pour',
    location: { description: 'Full deck, abutment 1 to abutment 2' },
    reason: 'Two boom pumps are available for the whole day; one placement removes two transverse construction joints over the piers.',
    proposedChange: 'Single placement from abutment 1 to abutment 2 with Type D retarded concrete instead of the five-stage sequence on sheet S-6.',
    neededBy: '2027-05-10',
    contractTimeImpactDays: -5,
    deck: { spansFt: [95, 120, 95], deckWidthFt: 46, slabThicknessIn: 8.5, haunchCyPerFt: 0.12 },
    plannedSequence: 'Five stages: positive-moment lengths of spans 1, 3 and 2, then the two pier lengths (sheet S-6).',
    proposedSequence: { kind: 'single_placement', description: 'One placement, starting at abutment 1.' },
    placement: { rateCyPerHr: 55, equipment: 'Two 47 m boom pumps, one bridge finishing machine' },
    retarder: { astmC494Type: 'D', product: 'Type D water-reducing retarder (trial batch TB-3)', initialSetHr: 11.5 },
  };
  const joint: RequestBody = {
    ...common,
    type: 'construction_joint_relocation',
    title: 'Move deck construction joint CJ-2 toward pier 2',
    location: { span: '2', description: 'Transverse deck joint CJ-2 in span 2' },
    reason: 'The finishing machine rails cannot be set at the joint station shown, over the utility bay.',
    proposedChange: 'Move CJ-2 from 30 ft to 12 ft past pier 1, with the joint roughened and doweled as on sheet S-7.',
    neededBy: '2027-04-20',
    element: 'deck',
    spansFt: [95, 120, 95],
    plannedLocation: { description: '30 ft past pier 1 (sheet S-7)', atFt: 125 },
    proposedLocation: { description: '12 ft past pier 1', atFt: 107 },
    preparation: { roughened: true, keyed: false, waterstop: false },
    plane: 'transverse',
  };

  const move = async (actor: Actor, id: string, event: DistributiveOmit<WorkflowEventInput, 'version'>) => {
    const row = await requestRow(db, id);
    await applyEvent({ db, publicUrl }, actor, id, { ...event, version: row!.request.version } as WorkflowEventInput);
  };

  const deckId = await createDraft(db, people.contractor, deck);
  await move(people.contractor, deckId, { type: 'submit' });

  const jointId = await createDraft(db, people.contractor, joint);
  await move(people.contractor, jointId, { type: 'submit' });
  await move(people.section_engineer, jointId, { type: 'forward', comment: 'Checked on site: the rail conflict is real. The new station is close to the inflection point; please check.' });
  await move(people.central_office, jointId, { type: 'route', eorUserId: people.engineer_of_record.id });
}
