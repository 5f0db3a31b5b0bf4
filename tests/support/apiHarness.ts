// Builds the real Express app against the test database and fakes, plus fixtures and sign-in.
import { S3Client } from '@aws-sdk/client-s3';
import request from 'supertest';
import { randomUUID } from 'node:crypto';
import { setTimeout as sleep } from 'node:timers/promises';
import { createDatabase, type Database } from '../../db/client';
import { projectMembers, projects } from '../../db/schema';
import { createApp } from '../../server/app';
import { createAuth } from '../../server/auth/auth';
import type { ServerEnv } from '../../server/env';
import { createMailer } from '../../server/mail/mailer';
import { startBackgroundJobs } from '../../server/jobs';
import type { Runner } from 'graphile-worker';
import { upsertAccount } from '../../server/people/accountRepository';
import { createObjectStore } from '../../server/storage/objectStore';
import { roles, type Role } from '../../shared/roles';
import { testServerEnv } from './testSettings';

export const testPassword = 'test-password-123';

export function buildTestApp(overrides: Partial<Record<keyof ServerEnv, string>> = {}) {
  const env = testServerEnv('api', overrides);
  const { db, pool } = createDatabase(env.DATABASE_URL, 5);
  const store = createObjectStore(env);
  const mailer = createMailer(env);
  const app = createApp({ env, db, auth: createAuth(db, env), store, mailer });
  let runner: Runner | null = null;
  return {
    env,
    db,
    pool,
    app,
    store,
    // The job worker (mail, reminders) only where a test wants delivery: a worker with a broken
    // SMTP setting would otherwise pick up and delay other tests' mail.
    startJobs: async () => {
      runner ??= await startBackgroundJobs({ pool, db, mailer, store, publicUrl: env.PUBLIC_URL, pollIntervalMs: 200 });
      return runner;
    },
    stopJobs: async () => {
      await runner?.stop();
      runner = null;
    },
    close: async () => {
      await runner?.stop();
      mailer.close();
      await pool.end();
    },
  };
}

export type TestApp = ReturnType<typeof buildTestApp>;

type Person = { id: string; email: string; name: string };

// A project of its own per test file, so parallel files never see each other's rows.
export async function createScenario(db: Database, options: { federalAid?: boolean } = {}) {
  const tag = randomUUID().slice(0, 8);
  const [project] = await db
    .insert(projects)
    .values({
      code: `T${tag.toUpperCase()}`,
      name: `Test structure ${tag}`,
      structureNumber: `99-${tag}`,
      featureCarried: 'Test Route 1',
      featureCrossed: 'Test Creek',
      county: 'Test County',
      contractNumber: `TC-${tag}`,
      contractorFirm: 'Test Builders',
      section: 'Test Section',
      federalAid: options.federalAid ?? false,
    })
    .returning();
  const [otherProject] = await db
    .insert(projects)
    .values({
      code: `U${tag.toUpperCase()}`,
      name: `Other structure ${tag}`,
      structureNumber: `98-${tag}`,
      featureCarried: 'Test Route 2',
      featureCrossed: 'Other Creek',
      county: 'Test County',
      contractNumber: `UC-${tag}`,
      contractorFirm: 'Other Builders',
      section: 'Other Section',
    })
    .returning();
  if (!project || !otherProject) throw new Error('fixture projects not written');

  async function person(role: Role, label: string, projectId: string): Promise<Person> {
    const email = `${label}-${tag}@test.spanrelay.test`;
    const name = `${label} ${tag}`;
    const id = await upsertAccount(db, { email, name, role, organization: `${label} org`, password: testPassword });
    await db.insert(projectMembers).values({ projectId, userId: id });
    return { id, email, name };
  }

  // One person per role on the project, the same roles again on the other project (non-members
  // of the first), and a second engineer of record on the project for reassignment.
  const members = {} as Record<Role, Person>;
  const outsiders = {} as Record<Role, Person>;
  for (const role of roles) {
    members[role] = await person(role, `${role.replace(/_/g, '-')}`, project.id);
    outsiders[role] = await person(role, `outside-${role.replace(/_/g, '-')}`, otherProject.id);
  }
  const secondEor = await person('engineer_of_record', 'second-eor', project.id);
  return {
    project,
    otherProject,
    members,
    outsiders,
    secondEor,
    contractor: members.contractor,
    sectionEngineer: members.section_engineer,
    fieldInspector: members.field_inspector,
    outsider: outsiders.contractor,
  };
}

export async function signIn(t: TestApp, email: string) {
  const agent = request.agent(t.app);
  const res = await agent.post('/api/auth/sign-in/email').set('origin', t.env.PUBLIC_URL).send({ email, password: testPassword });
  if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}: ${res.text}`);
  return agent;
}

export type CaughtMail = { to: string[]; subject: string; text: string; sentAt: string };

// Reads what the SMTP catcher received over SMTP, waiting a little for the dispatcher to deliver.
export async function waitForMail(env: ServerEnv, to: string, timeoutMs = 10_000): Promise<CaughtMail[]> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const all = (await (await fetch(`${env.MAIL_CATCHER_URL}/messages`)).json()) as CaughtMail[];
    const mine = all.filter((m) => m.to.includes(to));
    if (mine.length > 0) return mine;
    await sleep(100);
  }
  return [];
}

export function s3ClientFor(env: ServerEnv) {
  return new S3Client({
    endpoint: env.S3_ENDPOINT,
    region: env.S3_REGION,
    forcePathStyle: true,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
  });
}
