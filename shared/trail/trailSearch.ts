// The auditor's search over trails: the query string (the form validates with the same schema) and
// what a hit carries. Dates are whole UTC days; an ISO time with its offset bounds to the millisecond,
// which is how the web form sends the days of the reader's own time zone.
import { z } from 'zod';

export const trailDecisions = ['approved', 'approved_with_conditions', 'rejected', 'undecided'] as const;
export type TrailDecision = (typeof trailDecisions)[number];

export const trailDecisionLabels: Record<TrailDecision, string> = {
  approved: 'Approved',
  approved_with_conditions: 'Approved with conditions',
  rejected: 'Rejected',
  undecided: 'Not decided yet',
};

const dayPattern = /^(\d{4})-(\d{2})-(\d{2})$/;
const instant = z.iso.datetime({ offset: true });

function dayStart(value: string): Date | null {
  const m = dayPattern.exec(value);
  if (!m) return null;
  const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
  // 2027-02-30 would roll over into March; a day that does not exist is refused.
  return d.toISOString().slice(0, 10) === value ? d : null;
}

// The first moment a bound covers, and the first moment after the last one it covers.
export function boundsOf(value: string): { start: Date; end: Date } {
  const day = dayStart(value);
  if (day) return { start: day, end: new Date(day.getTime() + 86_400_000) };
  const at = new Date(value);
  return { start: at, end: new Date(at.getTime() + 1) };
}

const dateOrInstant = z
  .string()
  .trim()
  .refine((v) => dayStart(v) !== null || instant.safeParse(v).success, 'Give a date as YYYY-MM-DD.');

const text = (min: number, message: string) => z.string().trim().min(min, message).max(200, 'Shorten this to 200 characters.');

export const trailSearchQuerySchema = z
  .strictObject({
    number: text(1, 'Give part of a request number.').optional(),
    structure: text(1, 'Give part of a structure number.').optional(),
    person: text(2, 'Give at least two letters of a name or e-mail.').optional(),
    from: dateOrInstant.optional(),
    to: dateOrInstant.optional(),
    decision: z.enum(trailDecisions, { message: 'Choose approved, approved with conditions, rejected or not decided yet.' }).optional(),
    cursor: z.string().max(500).optional(),
    limit: z.coerce.number().int().min(1).max(100).default(25),
  })
  .superRefine((q, ctx) => {
    if (q.from && q.to && boundsOf(q.from).start.getTime() >= boundsOf(q.to).end.getTime()) {
      ctx.addIssue({ code: 'custom', path: ['to'], message: 'The end date is before the start date.' });
    }
  });

export type TrailSearchQuery = z.infer<typeof trailSearchQuerySchema>;
export type TrailSearchFilters = Omit<z.input<typeof trailSearchQuerySchema>, 'cursor' | 'limit'>;

export type TrailSearchHit = {
  id: string;
  number: string;
  title: string;
  state: string;
  decision: Exclude<TrailDecision, 'undecided'> | null;
  project: { id: string; code: string; name: string; structureNumber: string };
  lastEventAt: string;
  events: number;
};

export type TrailSearchPage = { items: TrailSearchHit[]; nextCursor: string | null };
