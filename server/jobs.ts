// The background work of one server process: mail delivery, decision records and the overdue-desk
// reminders, all run by graphile-worker on the application's own database.
import type { Pool } from 'pg';
import type { Database } from '../db/client';
import type { Mailer } from './mail/mailer';
import { startJobWorker } from './mail/mailQueue';
import { sendDeskReminders } from './workflow/deskReminders';
import { produceDecisionRecord } from './documents/decisionRecordJob';
import type { ObjectStore } from './storage/objectStore';

export function startBackgroundJobs(opts: { pool: Pool; db: Database; mailer: Mailer; store: ObjectStore; publicUrl: string; pollIntervalMs?: number }) {
  return startJobWorker({
    ...opts,
    tasks: {
      decision_record: async (payload) => {
        const { requestId, decidedById } = payload as { requestId: string; decidedById: string };
        await produceDecisionRecord(opts, requestId, decidedById);
      },
    },
    scheduled: {
      // Hourly is plenty for due periods counted in days.
      desk_reminders: { cron: '7 * * * *', run: async () => void (await sendDeskReminders(opts.db, opts.publicUrl)) },
    },
  });
}
