// The search as the form holds it, as the address keeps it, and as the API takes it. People pick
// days on their own calendar, so a day goes to the API as the instants its local midnight bounds.
import { trailDecisionLabels, trailDecisions, type TrailDecision, type TrailSearchFilters } from '../../shared/trail/trailSearch';

export type TrailSearchValues = { number: string; structure: string; person: string; from: string; to: string; decision: TrailDecision | '' };

export const filterNames = ['number', 'structure', 'person', 'from', 'to', 'decision'] as const;

export const emptySearch: TrailSearchValues = { number: '', structure: '', person: '', from: '', to: '', decision: '' };

// Empty fields are no filter at all.
export function filtersOf(values: TrailSearchValues): TrailSearchFilters {
  const filters: TrailSearchFilters = {};
  for (const name of filterNames) {
    const value = values[name].trim();
    if (value) Object.assign(filters, { [name]: value });
  }
  return filters;
}

export function valuesOf(params: Record<string, string | string[] | undefined>): TrailSearchValues {
  const one = (name: string) => {
    const v = params[name];
    return typeof v === 'string' ? v : '';
  };
  const decision = one('decision');
  return {
    number: one('number'),
    structure: one('structure'),
    person: one('person'),
    from: one('from'),
    to: one('to'),
    decision: (trailDecisions as readonly string[]).includes(decision) ? (decision as TrailDecision) : '',
  };
}

const day = /^(\d{4})-(\d{2})-(\d{2})$/;

function localDay(value: string, offsetDays: number): Date | null {
  const m = day.exec(value);
  return m ? new Date(Number(m[1]), Number(m[2]) - 1, Number(m[3]) + offsetDays) : null;
}

export function forApi(filters: TrailSearchFilters): TrailSearchFilters {
  const out = { ...filters };
  const from = filters.from ? localDay(filters.from, 0) : null;
  const nextDay = filters.to ? localDay(filters.to, 1) : null;
  if (from) out.from = from.toISOString();
  // The last millisecond of the local day; the server counts an instant bound inclusively.
  if (nextDay) out.to = new Date(nextDay.getTime() - 1).toISOString();
  return out;
}

// One line saying what the search is narrowed to, for the folded form on a phone.
export function describeFilters(values: TrailSearchValues): string {
  const f = filtersOf(values);
  const parts = [
    f.number ? `number ${f.number}` : null,
    f.structure ? `structure ${f.structure}` : null,
    f.person ? `person ${f.person}` : null,
    f.from && f.to ? `events ${f.from} to ${f.to}` : f.from ? `events from ${f.from}` : f.to ? `events up to ${f.to}` : null,
    f.decision ? trailDecisionLabels[f.decision].toLowerCase() : null,
  ].filter(Boolean);
  return parts.length ? `Narrowed to ${parts.join(' · ')}.` : 'No filters: every request you may read.';
}
