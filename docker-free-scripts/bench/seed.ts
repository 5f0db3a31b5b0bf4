// Fills the benchmark database: 2,000 projects, 100,000 requests and 1,000,000 trail events with
// real hash chains, written with multi-row inserts (unnest of column arrays, thousands of rows a
// statement). Prints a progress bar and the time taken; leaves what the load runs need in seed.json.
// Run by run.sh against a fresh database: npx tsx docker-free-scripts/bench/seed.ts
import { randomUUID } from 'node:crypto';
import { mkdirSync, writeFileSync } from 'node:fs';
import type { PoolClient } from 'pg';
import { createDatabase } from '../../db/client';
import { runMigrations } from '../../db/migrate';
import { upsertAccount } from '../../server/people/accountRepository';
import { trailHash } from '../../server/trail/trailChain';
import { deskDueAt } from '../../shared/requests/deskClock';
import { engineeringCheckFor } from '../../shared/requests/engineeringCheck';
import type { RequestBody } from '../../shared/requests/requestBody';
import { requestStateInfo, type RequestState } from '../../shared/requests/states';
import type { Role } from '../../shared/roles';
import { genesisHash } from '../../shared/trail/canonicalJson';
import { defaultDeskDueDays } from '../../shared/workflow/desks';
import { benchComments, decisionOf, longPath, pathTo, pickState, pickTitle, pickType, projectFacts, searchTermsFor, seededRandom, timesFor, type Move } from './agency';
import { benchDir, benchPassword, benchScale, benchSizes, seedInfoPath, type SeedInfo } from './scale';

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL must name the benchmark database');

const started = performance.now();
const now = Date.now();
const rand = seededRandom(20260611);
const { projects: P, requests: R, trailEvents: E } = benchSizes;
// A district is a twentieth of the agency (100 projects at full size): the desk engineer's is the
// first, the transition engineer's the second.
const district = Math.max(2, Math.round(P / 20));
const perProject = Math.floor(R / P);
const extraRequests = R - perProject * P;

// ---- progress -------------------------------------------------------------------------------
let lastDraw = 0;
function progress(label: string, done: number, total: number, force = false) {
  const t = performance.now();
  if (!force && t - lastDraw < 200) return;
  lastDraw = t;
  const width = 30;
  const filled = Math.round((done / total) * width);
  process.stderr.write(`\r  ${label.padEnd(14)} [${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${String(Math.round((done / total) * 100)).padStart(3)}% ${done.toLocaleString('en-US')}/${total.toLocaleString('en-US')}  ${((t - started) / 1000).toFixed(1)} s   `);
  if (force) process.stderr.write('\n');
}

// ---- bulk insert ----------------------------------------------------------------------------
type Column = { name: string; type: string; cast?: string };
class BulkTable {
  private cols: unknown[][];
  private pending: Promise<unknown>[] = [];
  // Statements are chained, never sent while the connection is still busy with the one before.
  private static chain: Promise<unknown> = Promise.resolve();
  rows = 0;
  constructor(
    private client: PoolClient,
    private table: string,
    private columns: Column[],
    private batch: number,
  ) {
    this.cols = columns.map(() => []);
  }
  add(...values: unknown[]) {
    values.forEach((v, i) => this.cols[i]!.push(v));
    this.rows += 1;
    if (this.cols[0]!.length >= this.batch) return this.flush();
    return Promise.resolve();
  }
  // The statement is queued on the connection at once; generating the next batch overlaps with
  // the database writing this one. At most two wait, so memory stays flat.
  async flush() {
    if (this.cols[0]!.length === 0) return;
    const names = this.columns.map((c) => `"${c.name}"`).join(', ');
    const unnest = this.columns.map((c, i) => `$${i + 1}::${c.type}[]`).join(', ');
    const selects = this.columns.map((c, i) => (c.cast ? `c${i}::${c.cast}` : `c${i}`)).join(', ');
    const aliases = this.columns.map((_, i) => `c${i}`).join(', ');
    const values = this.cols;
    this.cols = this.columns.map(() => []);
    const sql = `insert into ${this.table} (${names}) select ${selects} from unnest(${unnest}) as t(${aliases})`;
    const written = BulkTable.chain.then(() => this.client.query(sql, values));
    BulkTable.chain = written;
    this.pending.push(written);
    while (this.pending.length > 2) await this.pending.shift();
  }
  async done() {
    await this.flush();
    await Promise.all(this.pending);
    this.pending = [];
  }
}

// ---- people ---------------------------------------------------------------------------------
type Person = { id: string; email: string; name: string; role: Role; organization: string };
const filler: Person[] = [];
function fillerPerson(role: Role, label: string, organization: string): Person {
  const id = randomUUID();
  const p = { id, email: `${label}@bench.spanrelay.test`, name: `Bench ${label.replace(/-/g, ' ')}`, role, organization };
  filler.push(p);
  return p;
}

async function main() {
  mkdirSync(benchDir, { recursive: true });
  const { db, pool } = createDatabase(url!, 4);
  await runMigrations(db, pool);
  console.log(`seeding ${P.toLocaleString('en-US')} projects, ${R.toLocaleString('en-US')} requests, ${E.toLocaleString('en-US')} trail events (scale ${benchScale})`);

  // The people who sign in during the run have real passwords; everyone else only acts in the data.
  const account = (role: Role, label: string, organization: string) =>
    upsertAccount(db, { email: `${label}@bench.spanrelay.test`, name: `Bench ${label.replace(/-/g, ' ')}`, role, organization, password: benchPassword });
  const deskEngineer = await account('section_engineer', 'desk-engineer', 'District 1');
  const transitionEngineer = await account('section_engineer', 'transition-engineer', 'District 2');
  const centralOffice = await account('central_office', 'central-office', 'Bridge Office');
  const auditor = await account('auditor', 'auditor', 'Audit Office');

  const contractors = Array.from({ length: Math.ceil(P / 20) }, (_, i) => fillerPerson('contractor', `contractor-${i + 1}`, `Bench Builders ${i + 1}`));
  const eors = Array.from({ length: Math.ceil(P / (district * 2)) }, (_, i) => fillerPerson('engineer_of_record', `eor-${i + 1}`, `Design Firm ${i + 1}`));
  const inspectors = Array.from({ length: Math.ceil(P / district) }, (_, i) => fillerPerson('field_inspector', `inspector-${i + 1}`, `District ${i + 1}`));
  const sectionEngineers = Array.from({ length: Math.ceil(P / district) }, (_, i) =>
    i === 0 ? deskEngineer : i === 1 ? transitionEngineer : fillerPerson('section_engineer', `section-engineer-${i + 1}`, `District ${i + 1}`).id,
  );

  const client = await pool.connect();
  try {
    // Integrity is ours to keep in this bulk load: the rows are written parents first and every
    // reference is made here, so the per-row foreign-key triggers are skipped for the session.
    await client.query(`set session_replication_role = replica`);
    await client.query(`set synchronous_commit = off`);
    await client.query('begin');

    const users = new BulkTable(client, 'users', [
      { name: 'id', type: 'text' },
      { name: 'email', type: 'text' },
      { name: 'name', type: 'text' },
      { name: 'role', type: 'text' },
      { name: 'organization', type: 'text' },
      { name: 'email_verified', type: 'bool' },
    ], 5000);
    for (const p of filler) await users.add(p.id, p.email, p.name, p.role, p.organization, true);
    await users.done();

    // ---- projects and who is on them
    const projectIds: string[] = [];
    const projects = new BulkTable(client, 'projects', [
      { name: 'id', type: 'uuid' },
      { name: 'code', type: 'text' },
      { name: 'name', type: 'text' },
      { name: 'structure_number', type: 'text' },
      { name: 'feature_carried', type: 'text' },
      { name: 'feature_crossed', type: 'text' },
      { name: 'county', type: 'text' },
      { name: 'contract_number', type: 'text' },
      { name: 'contractor_firm', type: 'text' },
      { name: 'section', type: 'text' },
      { name: 'federal_aid', type: 'bool' },
      { name: 'next_request_seq', type: 'int4' },
    ], 5000);
    const members = new BulkTable(client, 'project_members', [
      { name: 'project_id', type: 'uuid' },
      { name: 'user_id', type: 'text' },
    ], 10000);
    const peopleOf = (p: number): Record<Role, string> => ({
      contractor: contractors[Math.floor(p / 20)]!.id,
      section_engineer: sectionEngineers[Math.floor(p / district)]!,
      central_office: centralOffice,
      engineer_of_record: eors[Math.floor(p / (district * 2))]!.id,
      field_inspector: inspectors[Math.floor(p / district)]!.id,
      auditor,
      admin: auditor,
    });
    for (let p = 0; p < P; p++) {
      const id = randomUUID();
      projectIds.push(id);
      const f = projectFacts(p);
      const count = perProject + (p < extraRequests ? 1 : 0);
      await projects.add(id, f.code, f.name, f.structureNumber, f.featureCarried, f.featureCrossed, f.county, f.contractNumber, f.contractorFirm, f.section, false, count + 1);
      const people = peopleOf(p);
      for (const role of ['contractor', 'section_engineer', 'central_office', 'engineer_of_record', 'field_inspector'] as const) await members.add(id, people[role]);
    }
    await projects.done();
    await members.done();
    progress('projects', P, P, true);

    // ---- requests, revisions, conditions, attachments and the trail
    const requests = new BulkTable(client, 'change_requests', [
      { name: 'id', type: 'uuid' },
      { name: 'number', type: 'text' },
      { name: 'project_id', type: 'uuid' },
      { name: 'type', type: 'text' },
      { name: 'title', type: 'text' },
      { name: 'state', type: 'text' },
      { name: 'version', type: 'int4' },
      { name: 'current_revision', type: 'int4' },
      { name: 'filed_by_id', type: 'text' },
      { name: 'assigned_eor_id', type: 'text' },
      { name: 'decision', type: 'text' },
      { name: 'desk_since', type: 'timestamptz' },
      // Written here: the trigger that keeps it (drizzle/0004_request_due_at.sql) is skipped with
      // the others in this session. The projects keep the default desk days.
      { name: 'due_at', type: 'timestamptz' },
      { name: 'created_at', type: 'timestamptz' },
      { name: 'updated_at', type: 'timestamptz' },
    ], 5000);
    const revisions = new BulkTable(client, 'request_revisions', [
      { name: 'request_id', type: 'uuid' },
      { name: 'revision', type: 'int4' },
      { name: 'body', type: 'text', cast: 'jsonb' },
      { name: 'engineering', type: 'text', cast: 'jsonb' },
      { name: 'created_at', type: 'timestamptz' },
      { name: 'submitted_at', type: 'timestamptz' },
    ], 5000);
    const conditions = new BulkTable(client, 'request_conditions', [
      { name: 'request_id', type: 'uuid' },
      { name: 'seq', type: 'int4' },
      { name: 'text', type: 'text' },
      { name: 'due_before', type: 'text' },
      { name: 'satisfied_by_id', type: 'text' },
      { name: 'satisfied_at', type: 'timestamptz' },
      { name: 'note', type: 'text' },
    ], 5000);
    const files = new BulkTable(client, 'attachments', [
      { name: 'id', type: 'uuid' },
      { name: 'request_id', type: 'uuid' },
      { name: 'revision', type: 'int4' },
      { name: 'object_key', type: 'text' },
      { name: 'file_name', type: 'text' },
      { name: 'content_type', type: 'text' },
      { name: 'size_bytes', type: 'int8' },
      { name: 'sha256', type: 'text' },
      { name: 'uploaded_by_id', type: 'text' },
      { name: 'uploaded_at', type: 'timestamptz' },
    ], 5000);
    const trail = new BulkTable(client, 'trail_events', [
      { name: 'request_id', type: 'uuid' },
      { name: 'seq', type: 'int4' },
      { name: 'event_type', type: 'text' },
      { name: 'state_before', type: 'text' },
      { name: 'state_after', type: 'text' },
      { name: 'actor_id', type: 'text' },
      { name: 'actor_role', type: 'text' },
      { name: 'comment', type: 'text' },
      { name: 'payload', type: 'text', cast: 'jsonb' },
      { name: 'created_at', type: 'timestamptz' },
      { name: 'prev_hash', type: 'text' },
      { name: 'hash', type: 'text' },
    ], 10000);

    // Fifty events for one request of each project; the rest share what is left evenly.
    const longEvents = 50;
    const shortEvents = (E - longEvents * P) / (R - P);
    const shortBase = Math.floor(shortEvents);
    let shortExtra = Math.round((shortEvents - shortBase) * (R - P));

    const transitionRequests = Math.max(1, (district * perProject - district) * 0.6);
    const poolSize = Math.min(benchSizes.transitionPool, Math.floor(transitionRequests));
    let poolLeft = poolSize;
    const transitionPool: SeedInfo['transitionPool'] = [];
    const detailIds: string[] = [];
    const baselineIds: string[] = [];
    const deckEngineering = JSON.stringify(engineeringCheckFor(deckBody(projectIds[0]!)));

    let written = 0;
    for (let p = 0; p < P; p++) {
      const projectId = projectIds[p]!;
      const code = projectFacts(p).code;
      const people = peopleOf(p);
      const count = perProject + (p < extraRequests ? 1 : 0);
      const inTransitionDistrict = p >= district && p < 2 * district;
      for (let k = 0; k < count; k++) {
        const id = randomUUID();
        const long = k === 0;
        let state: RequestState = long ? 'closed' : pickState(rand);
        // The transition engineer's district keeps a pool of requests at their desk, one forward each.
        const pooled = !long && inTransitionDistrict && poolLeft > 0 && rand() < poolLeft / Math.max(1, (2 * district - p) * count - k);
        if (pooled) state = 'section_review';
        const moves: Move[] = long ? longPath : pathTo[state];
        const events = long ? longEvents : Math.max(moves.length, shortBase + (shortExtra-- > 0 ? 1 : 0));
        const type = long ? 'deck_placement_change' : pickType(rand);
        const title = long ? 'Place the three-span deck in one pour' : pickTitle(rand, type);
        const { created, deskSince } = timesFor(rand, state, requestStateInfo[state].desk, now);
        const routedTo = moves.some((m) => m.eventType === 'route') ? people.engineer_of_record : null;
        const version = moves.length;
        const revisionCount = long ? 2 : 1;
        if (pooled) {
          transitionPool.push({ id, version });
          poolLeft -= 1;
        }
        if (long && p < district) detailIds.push(id);
        if (baselineIds.length < 1000 && rand() < 0.02) baselineIds.push(id);

        // Moves spread evenly from filing to the desk; comments fall after the second move.
        const moveAt = (j: number) => Math.round(moves.length === 1 ? created : created + (j * (deskSince - created)) / (moves.length - 1));
        const commentCount = events - moves.length;
        const after = Math.min(1, moves.length - 1);
        const gapEnd = after + 1 < moves.length ? moveAt(after + 1) : Math.max(moveAt(after) + 1000, now);
        let prevHash = genesisHash;
        let seq = 0;
        let lastAt = 0;
        const append = async (eventType: string, before: string | null, afterState: string, role: Role, at: number, comment: string | null) => {
          seq += 1;
          const createdAt = new Date(Math.floor(at)).toISOString();
          const actorId = people[role];
          const event = { requestId: id, seq, eventType, stateBefore: before, stateAfter: afterState, actorId, actorRole: role, comment, payload: {}, createdAt };
          const hash = trailHash(prevHash, event);
          await trail.add(id, seq, eventType, before, afterState, actorId, role, comment, '{}', createdAt, prevHash, hash);
          prevHash = hash;
          lastAt = Math.max(lastAt, Math.floor(at));
        };
        for (let j = 0; j < moves.length; j++) {
          const m = moves[j]!;
          await append(m.eventType, m.before, m.after, m.role, moveAt(j), null);
          if (j === after) {
            for (let c = 0; c < commentCount; c++) {
              const at = moveAt(after) + ((c + 1) * (gapEnd - moveAt(after))) / (commentCount + 1);
              await append('commented', m.after, m.after, c % 2 ? 'section_engineer' : 'contractor', at, benchComments[c % benchComments.length]!);
            }
          }
        }

        const number = `${code}-${String(k + 1).padStart(3, '0')}`;
        await requests.add(id, number, projectId, type, title, state, version, revisionCount, people.contractor, routedTo, decisionOf[state] ?? null,
          new Date(deskSince).toISOString(), deskDueAt(state, new Date(deskSince), defaultDeskDueDays)?.toISOString() ?? 'infinity',
          new Date(created).toISOString(), new Date(Math.max(lastAt, deskSince)).toISOString());
        const submitted = state === 'drafting' ? null : new Date(moveAt(1)).toISOString();
        if (long) {
          const body = JSON.stringify(deckBody(projectId));
          await revisions.add(id, 1, body, deckEngineering, new Date(created).toISOString(), submitted);
          await revisions.add(id, 2, body, deckEngineering, new Date(moveAt(4)).toISOString(), new Date(moveAt(5)).toISOString());
          for (const c of [1, 2]) {
            await conditions.add(id, c, c === 1 ? 'Trial batch set-time test repeated with the job cement lot' : 'Standby pump on site for the whole placement',
              c === 1 ? 'before placement' : 'during placement', people.field_inspector, new Date(moveAt(8 + c)).toISOString(), 'Seen on site.');
          }
          for (const f of ['placement-plan.pdf', 'pump-layout.pdf', 'set-time-test.pdf']) {
            await files.add(randomUUID(), id, 2, `projects/${projectId}/requests/${id}/rev-2/${randomUUID()}`, f, 'application/pdf', 180_000, 'b'.repeat(64), people.contractor, new Date(moveAt(5)).toISOString());
          }
        } else {
          await revisions.add(id, 1, JSON.stringify(shortBody(type, projectId, title)), null, new Date(created).toISOString(), submitted);
        }
        written += 1;
        progress('requests', written, R);
      }
    }
    await Promise.all([requests.done(), revisions.done(), conditions.done(), files.done(), trail.done()]);
    progress('requests', R, R, true);
    process.stderr.write(`  trail events   ${trail.rows.toLocaleString('en-US')} written\n`);
    await client.query('commit');
    await client.query(`set session_replication_role = origin`);
    process.stderr.write('  vacuum analyze …\n');
    // Vacuumed as well, as autovacuum leaves a live database: index-only scans need the visibility map.
    await client.query('vacuum analyze');
    // The due dates written above against the database's own rule, so a seed that drifted from the
    // trigger cannot leave the desks sorted by dates the product would never store.
    const { rows: drift } = await client.query<{ n: number }>(
      `select count(*)::int as n from change_requests c join projects p on p.id = c.project_id
        where c.due_at is distinct from change_request_due_at(c.state, c.desk_since, p.desk_due_days)`,
    );
    if (drift[0]!.n > 0) throw new Error(`${drift[0]!.n} seeded due dates differ from change_request_due_at`);

    const info: SeedInfo = {
      scale: benchScale,
      sizes: benchSizes,
      seconds: (performance.now() - started) / 1000,
      people: {
        deskEngineer: 'desk-engineer@bench.spanrelay.test',
        transitionEngineer: 'transition-engineer@bench.spanrelay.test',
        centralOffice: 'central-office@bench.spanrelay.test',
        auditor: 'auditor@bench.spanrelay.test',
      },
      deskProjects: district,
      detailIds,
      transitionPool,
      searchTerms: searchTermsFor(P),
      baselineIds,
    };
    writeFileSync(seedInfoPath, JSON.stringify(info, null, 1));
    console.log(`seeded ${R.toLocaleString('en-US')} requests and ${trail.rows.toLocaleString('en-US')} trail events in ${info.seconds.toFixed(1)} s (transition pool ${transitionPool.length}, ${detailIds.length} fifty-event requests at the desk)`);
  } catch (err) {
    await client.query('rollback').catch(() => {});
    throw err;
  } finally {
    client.release();
    await pool.end();
  }
}

function shortBody(type: string, projectId: string, title: string) {
  return {
    type,
    projectId,
    title,
    location: { description: 'As named in the title' },
    planSheets: ['S-4'],
    reason: 'Site conditions differ from the plans at this location.',
    proposedChange: 'As described in the title, with details on the marked-up sheet.',
    neededBy: '2027-03-01',
    costImpact: { kind: 'none' },
    contractTimeImpactDays: 0,
  };
}

function deckBody(projectId: string): RequestBody {
  return {
    type: 'deck_placement_change',
    projectId,
    title: 'Place the three-span deck in one pour',
    location: { description: 'Full deck, abutment 1 to abutment 2' },
    planSheets: ['S-6', 'S-7'],
    reason: 'Two pump trucks are available and a single placement removes two transverse joints.',
    proposedChange: 'One continuous placement with retarded concrete instead of the phased sequence.',
    neededBy: '2027-05-01',
    costImpact: { kind: 'none' },
    contractTimeImpactDays: -4,
    deck: { spansFt: [90, 110, 90], deckWidthFt: 44, slabThicknessIn: 8.5 },
    plannedSequence: 'Positive-moment segments first, then the pier segments (sheet S-6).',
    proposedSequence: { kind: 'single_placement', description: 'Start at abutment 1 and finish at abutment 2.' },
    placement: { rateCyPerHr: 60, equipment: 'Two boom pumps, one finishing machine' },
    retarder: { astmC494Type: 'D', product: 'Generic Type D retarder', initialSetHr: 12 },
  };
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
