// The form's resolver: the typed values become a body of the chosen type and the shared
// `requestBodySchema` judges it, so the form refuses exactly what the server would. Each
// complaint is moved onto the box it is about, in plainer words where the schema is generic.
import { z } from 'zod';
import { requestBodySchema, type RequestBody } from '../../../shared/requests/requestBody';
import { filingBody } from './filingBody';
import { emptyFiling, type FilingFormValues } from './formValues';

function leaves(value: unknown, prefix: string, out: string[]) {
  if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value as Record<string, unknown>)) leaves(v, prefix ? `${prefix}.${k}` : k, out);
  } else out.push(prefix);
}

const formFields: string[] = [];
leaves(emptyFiling('other_deviation', ''), '', formFields);
const known = new Set(formFields);

/** Every box of the form by its path ("location.description"), in the order the values declare them. */
export const filingFieldNames: readonly string[] = formFields;

// A complaint about a whole group (missing, or the wrong kind of thing) goes to its first box.
const groupHome: Record<string, string> = {
  location: 'location.description',
  costImpact: 'costImpact.kind',
  deck: 'deck.spansFt',
  proposedSequence: 'proposedSequence.kind',
  placement: 'placement.rateCyPerHr',
  retarder: 'retarder.astmC494Type',
  plannedLocation: 'plannedLocation.description',
  proposedLocation: 'proposedLocation.description',
  preparation: 'preparation.roughened',
  specified: 'specified.kind',
  substitute: 'substitute.kind',
};

/** The form box a schema (or server) complaint at `path` belongs to, or null if none shows it. */
export function fieldFor(path: readonly PropertyKey[]): string | null {
  const keys: string[] = [];
  for (const p of path) {
    if (typeof p === 'number' || /^\d+$/.test(String(p))) break;
    keys.push(String(p));
  }
  if (keys.length === 0) return null;
  if (keys[0] === 'costImpact' && keys[1] !== 'amountUsd') return 'costImpact.kind';
  const name = keys.join('.');
  if (known.has(name) && name !== 'type' && name !== 'useRetarder') return name;
  return groupHome[keys[0]!] ?? null;
}

const spanWords = 'Enter the span lengths in feet, separated by commas, e.g. 95, 120, 95.';
const plainerWords: Record<string, string> = {
  'costImpact.kind': 'Say whether the change costs more, less, or the same.',
  planSheets: 'Each plan sheet is at most 40 characters; separate sheets with commas.',
  'deck.spansFt': spanWords,
  spansFt: spanWords,
  'deck.haunchCyPerFt': 'The haunch is in cubic yards per foot of deck, from 0 to 5; leave it empty if none.',
  'proposedSequence.kind': 'Choose the proposed sequence.',
  'retarder.astmC494Type': 'A set retarder is ASTM C494 Type B or Type D.',
  material: 'Choose the superstructure material.',
  climate: 'Choose the climate.',
  plane: 'Choose the plane of the joint.',
  gapAtReferenceIn: 'Enter the opening in inches, from 0 to 48, or leave it empty.',
  referenceTempF: 'Enter the reference temperature in °F, from -40 to 140, or leave it empty.',
};

function sealWords(field: string): string | undefined {
  const [side, part] = field.split('.');
  if (side !== 'specified' && side !== 'substitute') return undefined;
  const words: Record<string, string> = {
    kind: 'Choose the kind of seal.',
    movementCapacityIn: 'Enter the movement capacity in inches.',
    minOpeningIn: 'Enter the minimum opening in inches (0 or more).',
    maxOpeningIn: 'Enter the maximum opening in inches.',
  };
  return part ? words[part] : undefined;
}

export function fieldMessage(field: string, path: readonly PropertyKey[], message: string): string {
  const generic = /^(Invalid|Too small|Too big)/.test(message);
  if (field === 'planSheets' && path.length === 1) return message;
  const index = path.findIndex((p) => typeof p === 'number');
  if ((field === 'deck.spansFt' || field === 'spansFt') && index >= 0 && !generic) return `Span ${Number(path[index]) + 1}: ${message}`;
  return generic ? (plainerWords[field] ?? sealWords(field) ?? message) : message;
}

/** The shared schema's complaints about a body, each placed on one box (first complaint wins). */
export function placedIssues(issues: readonly z.core.$ZodIssue[]): { target: string; message: string }[] {
  const seen = new Set<string>();
  const out: { target: string; message: string }[] = [];
  for (const issue of issues) {
    const field = fieldFor(issue.path);
    const target = field ?? 'root';
    if (seen.has(target)) continue;
    seen.add(target);
    out.push({ target, message: field ? fieldMessage(field, issue.path, issue.message) : issue.message });
  }
  return out;
}

export const filingSchema = z.custom<FilingFormValues>().transform((values, ctx): RequestBody => {
  const parsed = requestBodySchema.safeParse(filingBody(values));
  if (parsed.success) return parsed.data;
  for (const { target, message } of placedIssues(parsed.error.issues)) ctx.addIssue({ code: 'custom', path: target.split('.'), message });
  return z.NEVER;
});
