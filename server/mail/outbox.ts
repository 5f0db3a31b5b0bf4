// Mail is queued inside the transaction of the move that causes it, then delivered by this
// dispatcher: a move never waits on SMTP, and a message survives an SMTP outage or a restart.
import { and, asc, eq, lte, sql } from 'drizzle-orm';
import type { Database, Transaction } from '../../db/client';
import { mailOutbox } from '../../db/schema';
import type { Mailer, OutgoingMail } from './mailer';

const maxAttempts = 8;

export async function enqueueMail(tx: Transaction, requestId: string | null, mails: OutgoingMail[]): Promise<void> {
  if (mails.length === 0) return;
  await tx.insert(mailOutbox).values(mails.map((m) => ({ toAddress: m.to, subject: m.subject, body: m.text, requestId })));
}

export type OutboxDispatcher = { kick(): Promise<void>; start(intervalMs?: number): void; stop(): void };

export function createOutboxDispatcher(db: Database, mailer: Mailer): OutboxDispatcher {
  let running: Promise<void> | null = null;
  let again = false;
  let timer: NodeJS.Timeout | null = null;

  async function deliverBatch(): Promise<number> {
    return db.transaction(async (tx) => {
      const due = await tx
        .select()
        .from(mailOutbox)
        .where(and(eq(mailOutbox.status, 'pending'), lte(mailOutbox.nextAttemptAt, sql`now()`)))
        .orderBy(asc(mailOutbox.createdAt))
        .limit(20)
        .for('update', { skipLocked: true });
      for (const mail of due) {
        try {
          await mailer.send({ to: mail.toAddress, subject: mail.subject, text: mail.body });
          await tx.update(mailOutbox).set({ status: 'sent', sentAt: sql`now()`, attempts: mail.attempts + 1 }).where(eq(mailOutbox.id, mail.id));
        } catch (err) {
          const attempts = mail.attempts + 1;
          // Back off quadratically so a long SMTP outage does not turn into a tight retry loop.
          await tx
            .update(mailOutbox)
            .set({
              attempts,
              lastError: String((err as Error).message ?? err).slice(0, 500),
              status: attempts >= maxAttempts ? 'failed' : 'pending',
              nextAttemptAt: sql`now() + make_interval(secs => ${attempts * attempts * 5})`,
            })
            .where(eq(mailOutbox.id, mail.id));
        }
      }
      return due.length;
    });
  }

  async function drain() {
    do {
      again = false;
      while ((await deliverBatch()) === 20);
    } while (again);
  }

  return {
    kick() {
      if (running) {
        again = true;
        return running;
      }
      running = drain()
        .catch((err) => console.error('[spanrelay] mail dispatch failed', err))
        .finally(() => {
          running = null;
        });
      return running;
    },
    start(intervalMs = 5000) {
      timer ??= setInterval(() => void this.kick(), intervalMs);
      timer.unref();
    },
    stop() {
      if (timer) clearInterval(timer);
      timer = null;
    },
  };
}
