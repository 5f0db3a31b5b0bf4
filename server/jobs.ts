// The background work of one server process: mail delivery and the overdue-desk reminders, both
// run by graphile-worker on the application's own database.
import type { Pool } from 'pg';
import type { Database } from '../db/client';
import type { Mailer } from './mail/mailer';
import { startJobWorker } from './mail/mailQueue';
import { sendDeskReminders } from './workflow/deskReminders';

export function startBackgroundJobs(opts: { pool: Pool; db: Database; mailer: Mailer; publicUrl: string; pollIntervalMs?: number }) {
  return startJobWorker({
    ...opts,
    scheduled: {
      // Hourly is plenty for due periods counted in days.
      desk_reminders: { cron: '7 * * * *', run: async () => void (await sendDeskReminders(opts.db, opts.publicUrl)) },
    },
  });
}
