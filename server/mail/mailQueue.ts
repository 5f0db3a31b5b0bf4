// Mail rides a job queue kept in PostgreSQL (graphile-worker). A message is written to
// mail_outbox and its delivery job queued inside the transaction of the move that causes it, so no
// mail goes out for a move that rolled back and none is lost to an SMTP outage. The outbox row's
// unique idempotency key and its row lock at delivery mean one message per event and recipient,
// even with retries and several server processes.
import { eq, sql } from 'drizzle-orm';
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

export async function deliverQueuedMail(db: Database, mailer: Mailer, outboxId: string): Promise<void> {
  const failure = await db.transaction(async (tx) => {
    const [row] = await tx.select().from(mailOutbox).where(eq(mailOutbox.id, outboxId)).for('update');
    if (!row || row.status === 'sent') return null;
    try {
      await mailer.send({ to: row.toAddress, subject: row.subject, text: row.body, messageId: `<${row.idempotencyKey}@spanrelay.mail>` });
      await tx.update(mailOutbox).set({ status: 'sent', sentAt: sql`now()`, attempts: row.attempts + 1 }).where(eq(mailOutbox.id, row.id));
      return null;
    } catch (err) {
      const message = err instanceof Error ? err.message : String(err);
      await tx.update(mailOutbox).set({ attempts: row.attempts + 1, lastError: message.slice(0, 500) }).where(eq(mailOutbox.id, row.id));
      return new Error(`mail ${row.id} to ${row.toAddress} not delivered: ${message}`);
    }
  });
  // Thrown after the attempt is recorded, so graphile-worker retries with its backoff.
  if (failure) throw failure;
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
    noHandleSignals: true,
    pollInterval: opts.pollIntervalMs ?? 2000,
    logger: quietLogger,
  });
}
