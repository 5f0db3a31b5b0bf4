// The statements of a move, each doing several things in one round trip (tests/api/moveStatements
// counts them): a forward is begin, the lock, the facts under the lock, the record, commit.
//
// The lock and the facts cannot be one statement: a statement that waits for the row lock goes on
// with the snapshot it started with, so the trail's last link, the open conditions and the clock it
// read would be older than the move that held the lock. The statement after the lock sees that
// move's writes.
import type { Transaction } from '../../db/client';
import type { Role } from '../../shared/roles';
import type { TrailLink } from '../trail/trailChain';
import { runNamed } from '../../db/namedStatements';
import type { MoveMail, PeopleToTell, Person } from './notifications';

export type MoveRequest = {
  id: string;
  number: string;
  title: string;
  projectId: string;
  filedById: string;
  state: string;
  version: number;
  currentRevision: number;
  assignedEorId: string | null;
  majorChange: boolean | null;
  federalConcurrenceAttachmentId: string | null;
};

export type LockedForMove = {
  request: MoveRequest;
  federalAid: boolean;
  projectName: string;
  structureNumber: string;
  // Whether the actor is a member of the request's project (auditors read without being one).
  member: boolean;
  people: PeopleToTell;
};

const personJson = `json_build_object('id', u.id, 'name', u.name, 'email', u.email, 'role', u.role)`;

// The request's row lock, with its project, the actor's membership and the people the move may tell
// (none when $5 is false: a comment tells no one). Membership and people are not written under this
// lock, so the snapshot this statement started with is good enough for them.
const lockText = `
select cr.id, cr.number, cr.title, cr.project_id, cr.filed_by_id, cr.state, cr.version, cr.current_revision,
  cr.assigned_eor_id, cr.major_change, cr.federal_concurrence_attachment_id,
  p.federal_aid, p.name as project_name, p.structure_number,
  exists (select 1 from project_members pm where pm.project_id = cr.project_id and pm.user_id = $2) as member,
  case when $5::boolean and cardinality($3::text[]) > 0 then (
    select coalesce(json_agg(${personJson} order by u.name), '[]'::json)
    from project_members pm join users u on u.id = pm.user_id
    where pm.project_id = cr.project_id and u.role = any($3::text[])) end as members,
  case when $5::boolean then (
    select coalesce(json_agg(${personJson}), '[]'::json)
    from users u where u.id = any(array[cr.filed_by_id, cr.assigned_eor_id, $4::text])) end as by_id
from change_requests cr join projects p on p.id = cr.project_id
where cr.id = $1
for update of cr`;

type LockRow = {
  id: string;
  number: string;
  title: string;
  project_id: string;
  filed_by_id: string;
  state: string;
  version: number;
  current_revision: number;
  assigned_eor_id: string | null;
  major_change: boolean | null;
  federal_concurrence_attachment_id: string | null;
  federal_aid: boolean;
  project_name: string;
  structure_number: string;
  member: boolean;
  members: Person[] | null;
  by_id: Person[] | null;
};

export async function lockForMove(
  tx: Transaction,
  requestId: string,
  actorId: string,
  tell: { roles: Role[]; personId: string | null } | null,
): Promise<LockedForMove | null> {
  const [row] = await runNamed<LockRow>(tx, 'move_lock', lockText, [requestId, actorId, tell?.roles ?? [], tell?.personId ?? null, tell !== null]);
  if (!row) return null;
  return {
    request: {
      id: row.id,
      number: row.number,
      title: row.title,
      projectId: row.project_id,
      filedById: row.filed_by_id,
      state: row.state,
      version: row.version,
      currentRevision: row.current_revision,
      assignedEorId: row.assigned_eor_id,
      majorChange: row.major_change,
      federalConcurrenceAttachmentId: row.federal_concurrence_attachment_id,
    },
    federalAid: row.federal_aid,
    projectName: row.project_name,
    structureNumber: row.structure_number,
    member: row.member,
    people: { members: row.members ?? [], byId: new Map((row.by_id ?? []).map((p) => [p.id, p])) },
  };
}

// Under the lock: the open conditions, the trail's last link and the database's clock.
const factsText = `
select (select count(*) from request_conditions c where c.request_id = $1 and c.satisfied_at is null)::int as open_conditions,
  last.seq, last.hash, date_trunc('milliseconds', clock_timestamp()) as at
from (select 1) as one
left join lateral (
  select t.seq, t.hash from trail_events t where t.request_id = $1 order by t.seq desc limit 1
) as last on true`;

export async function factsUnderLock(tx: Transaction, requestId: string): Promise<{ openConditions: number; link: TrailLink }> {
  const [row] = await runNamed<{ open_conditions: number; seq: number | null; hash: string | null; at: Date }>(tx, 'move_facts', factsText, [requestId]);
  if (!row) throw new Error('the database clock answered no row');
  return { openConditions: row.open_conditions, link: { seq: row.seq === null ? null : Number(row.seq), hash: row.hash, clock: new Date(row.at) } };
}

// What a move changes on the request besides its state, version and times.
export type RequestChange = {
  title?: string;
  assignedEorId?: string;
  currentRevision?: number;
  decision?: string;
  majorChange?: boolean;
  federalConcurrenceAttachmentId?: string | null;
};

// The record of a move in one statement: the trail event, the request's new state, and for each
// person told an outbox row (keyed by trail event and address: one message per event and person)
// with its delivery job, queued with the move so none goes out for a move that rolled back.
const recordText = `
with event as (
  insert into trail_events (request_id, seq, event_type, state_before, state_after, actor_id, actor_role, comment, payload, created_at, prev_hash, hash)
  values ($1, $2, $3, $4, $5, $6, $7, $8, $9::jsonb, $10, $11, $12)
  returning id
), moved as (
  update change_requests set
    state = $5,
    version = $13,
    updated_at = $10,
    desk_since = case when $14::boolean then $10 else desk_since end,
    title = case when $15::jsonb ? 'title' then $15::jsonb ->> 'title' else title end,
    assigned_eor_id = case when $15::jsonb ? 'assignedEorId' then $15::jsonb ->> 'assignedEorId' else assigned_eor_id end,
    current_revision = case when $15::jsonb ? 'currentRevision' then ($15::jsonb ->> 'currentRevision')::int else current_revision end,
    decision = case when $15::jsonb ? 'decision' then $15::jsonb ->> 'decision' else decision end,
    major_change = case when $15::jsonb ? 'majorChange' then ($15::jsonb ->> 'majorChange')::boolean else major_change end,
    federal_concurrence_attachment_id = case when $15::jsonb ? 'federalConcurrenceAttachmentId'
      then ($15::jsonb ->> 'federalConcurrenceAttachmentId')::uuid else federal_concurrence_attachment_id end
  where id = $1
  returning id
), outbox as (
  insert into mail_outbox (idempotency_key, to_address, subject, body, request_id)
  select 'trail:' || event.id || ':' || m.address, m.address, m.subject, m.body, $1
  from event, rows from (jsonb_to_recordset($16::jsonb) as (address text, subject text, body text)) with ordinality as m(address, subject, body, n)
  order by m.n
  on conflict (idempotency_key) do nothing
  returning id
), jobs as (
  select graphile_worker.add_job('deliver_mail', json_build_object('outboxId', outbox.id::text), max_attempts => 25, job_key => 'mail:' || outbox.id)
  from outbox
)
select event.id, (select count(*) from moved)::int as moved, (select count(*) from jobs)::int as queued from event`;

export type MoveRecord = {
  requestId: string;
  link: { seq: number; prevHash: string; hash: string; createdAt: Date };
  eventType: string;
  stateBefore: string | null;
  stateAfter: string;
  actor: { id: string; role: Role };
  comment: string | null;
  payload: Record<string, unknown>;
  version: number;
  newDesk: boolean;
  change: RequestChange;
  mails: MoveMail[];
};

export async function recordMove(tx: Transaction, m: MoveRecord): Promise<{ trailEventId: number; queued: number }> {
  const [row] = await runNamed<{ id: string; moved: number; queued: number }>(tx, 'move_record', recordText, [
    m.requestId,
    m.link.seq,
    m.eventType,
    m.stateBefore,
    m.stateAfter,
    m.actor.id,
    m.actor.role,
    m.comment,
    JSON.stringify(m.payload),
    m.link.createdAt,
    m.link.prevHash,
    m.link.hash,
    m.version,
    m.newDesk,
    JSON.stringify(m.change),
    JSON.stringify(m.mails.map((mail) => ({ address: mail.to, subject: mail.subject, body: mail.text }))),
  ]);
  if (!row || row.moved !== 1) throw new Error(`move of request ${m.requestId} was not recorded`);
  return { trailEventId: Number(row.id), queued: row.queued };
}
