// Mail rides a job queue kept in PostgreSQL (graphile-worker). A message is written to
// mail_outbox and its delivery job queued inside the transaction of the move that causes it, so no
// mail goes out for a move that rolled back and none is lost to an SMTP outage. The outbox row's
// unique idempotency key and its single delivery job (job key) mean one message per event and
// recipient, even with retries and several server processes.
import { and, eq, ne, sql } from 'drizzle-orm';
import { run, type Runner, type Task } from 'graphile-worker';
import type { Pool } from 'pg';
import type { Database, Transaction } from '../../db/client';
import { quietLogger } from '../../db/migrate';
import { mailOutbox } from '../../db/schema';
import type { Mailer } from './mailer';

export type QueuedMail = { idempotencyKey: string; to: string; subject: string; text: string; requestId: string | null };

export async function queueMail(tx: Transaction, mails: QueuedMail[]): Promise<number> {
  let queued = 0;
  for (const mail of mails) {
    const [row] = await tx
      .insert(mailOutbox)
      .values({ idempotencyKey: mail.idempotencyKey, toAddress: mail.to, subject: mail.subject, body: mail.text, requestId: mail.requestId })
      .onConflictDoNothing({ target: mailOutbox.idempotencyKey })
      .returning({ id: mailOutbox.id });
    if (!row) continue;
    await tx.execute(
      sql`select graphile_worker.add_job('deliver_mail', json_build_object('outboxId', ${row.id}::text), max_attempts => 25, job_key => ${`mail:${row.id}`})`,
    );
    queued += 1;
  }
  return queued;
}

// One delivery attempt. graphile-worker runs a job on one worker at a time and the outbox row has
// exactly one job (its job key), so the attempt needs no row lock held across the SMTP exchange: a
// read, the send, and one write to record it (two statements where a transaction took four).
// A message sent whose record then fails is sent again on the retry, as it was when the commit after
// the send failed; the Message-ID carries the idempotency key so a receiver can spot the repeat.
export async function deliverQueuedMail(db: Database, mailer: Mailer, outboxId: string): Promise<void> {
  const [row] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, outboxId));
  if (!row || row.status === 'sent') return;
  try {
    await mailer.send({ to: row.toAddress, subject: row.subject, text: row.body, messageId: `<${row.idempotencyKey}@spanrelay.mail>` });
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    await db.update(mailOutbox).set({ attempts: sql`${mailOutbox.attempts} + 1`, lastError: message.slice(0, 500) }).where(eq(mailOutbox.id, row.id));
    // Thrown after the attempt is recorded, so graphile-worker retries with its backoff.
    throw new Error(`mail ${row.id} to ${row.toAddress} not delivered: ${message}`);
  }
  await db
    .update(mailOutbox)
    .set({ status: 'sent', sentAt: sql`now()`, attempts: sql`${mailOutbox.attempts} + 1` })
    .where(and(eq(mailOutbox.id, row.id), ne(mailOutbox.status, 'sent')));
}

export type JobWorkerOptions = {
  pool: Pool;
  db: Database;
  mailer: Mailer;
  // Other queued work (the decision record), by task name.
  tasks?: Record<string, Task>;
  // Scheduled work (the overdue reminders), by task name.
  scheduled?: Record<string, { cron: string; run: () => Promise<void> }>;
  pollIntervalMs?: number;
};

export async function startJobWorker(opts: JobWorkerOptions): Promise<Runner> {
  const deliver: Task = async (payload) => {
    const { outboxId } = payload as { outboxId: string };
    await deliverQueuedMail(opts.db, opts.mailer, outboxId);
  };
  const taskList: Record<string, Task> = { ...opts.tasks, deliver_mail: deliver };
  const crontab: string[] = [];
  for (const [name, job] of Object.entries(opts.scheduled ?? {})) {
    taskList[name] = () => job.run();
    crontab.push(`${job.cron} ${name}`);
  }
  return run({
    pgPool: opts.pool,
    taskList,
    crontab: crontab.join('\n'),
    concurrency: 2,
    // Finished jobs are deleted in batches (one statement for the jobs finished within 100 ms, where
    // each took one): under a run of moves every delivery otherwise costs the database a statement
    // more. A process killed inside that window leaves those jobs locked until graphile-worker's
    // lock expires and then runs them again; each task is safe to repeat (a sent message is not sent
    // again, a decision record is made once, reminders once per period).
    preset: { worker: { completeJobBatchDelay: 100 } },
    noHandleSignals: true,
    pollInterval: opts.pollIntervalMs ?? 2000,
    logger: quietLogger,
  });
}
