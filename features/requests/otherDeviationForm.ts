// The "other deviation" form: what the person types (all text), turned into a request body and
// checked with the shared `requestBodySchema`, so the form refuses exactly what the server would.
import { z } from 'zod';
import { requestBodySchema, type RequestBody } from '../../shared/requests/requestBody';

export const costKinds = ['none', 'credit', 'added_cost'] as const;
export type CostKind = (typeof costKinds)[number];

export const costKindLabels: Record<CostKind, string> = {
  none: 'No change in cost',
  credit: 'Credit to the owner',
  added_cost: 'Added cost',
};

const formFields = z.object({
  projectId: z.string(),
  title: z.string(),
  location: z.object({ description: z.string(), span: z.string(), station: z.string() }),
  planSheets: z.string(),
  reason: z.string(),
  proposedChange: z.string(),
  neededBy: z.string(),
  costImpact: z.object({ kind: z.union([z.enum(costKinds), z.literal('')]), amountUsd: z.string() }),
  contractTimeImpactDays: z.string(),
});

export type OtherDeviationFormValues = z.input<typeof formFields>;

// Every field the form shows, by the path the schema reports errors on.
export const otherDeviationFieldNames = [
  'projectId',
  'title',
  'location.description',
  'location.span',
  'location.station',
  'planSheets',
  'reason',
  'proposedChange',
  'neededBy',
  'costImpact.kind',
  'costImpact.amountUsd',
  'contractTimeImpactDays',
] as const;
export type OtherDeviationFieldName = (typeof otherDeviationFieldNames)[number];

export function emptyOtherDeviation(projectId: string): OtherDeviationFormValues {
  return {
    projectId,
    title: '',
    location: { description: '', span: '', station: '' },
    planSheets: '',
    reason: '',
    proposedChange: '',
    neededBy: '',
    costImpact: { kind: '', amountUsd: '' },
    contractTimeImpactDays: '',
  };
}

const blankToUndefined = (s: string) => (s.trim() === '' ? undefined : s.trim());

// An empty box must stay empty, not become 0, so the schema can ask for it.
function numberOrUndefined(s: string): number | undefined {
  const cleaned = s.replace(/[$,\s]/g, '').replace(/^\+/, '');
  return cleaned === '' ? undefined : Number(cleaned);
}

export function splitPlanSheets(text: string): string[] {
  return text
    .split(/[,;\n]/)
    .map((s) => s.trim())
    .filter(Boolean);
}

export function otherDeviationBody(v: OtherDeviationFormValues): Record<string, unknown> {
  const kind = v.costImpact.kind;
  return {
    type: 'other_deviation',
    projectId: v.projectId,
    title: v.title,
    location: { description: v.location.description, span: blankToUndefined(v.location.span), station: blankToUndefined(v.location.station) },
    planSheets: splitPlanSheets(v.planSheets),
    reason: v.reason,
    proposedChange: v.proposedChange,
    neededBy: v.neededBy.trim(),
    costImpact: kind === '' ? undefined : kind === 'none' ? { kind } : { kind, amountUsd: numberOrUndefined(v.costImpact.amountUsd) },
    contractTimeImpactDays: numberOrUndefined(v.contractTimeImpactDays),
  };
}

// Where a schema (or server) complaint belongs on the form, and a plainer word where the shared
// schema only has the generic one.
export function fieldFor(path: readonly PropertyKey[]): OtherDeviationFieldName | null {
  const [head, next] = path;
  if (head === 'planSheets') return 'planSheets';
  if (head === 'costImpact') return next === 'amountUsd' ? 'costImpact.amountUsd' : 'costImpact.kind';
  if (head === 'location') return next === 'span' ? 'location.span' : next === 'station' ? 'location.station' : 'location.description';
  const name = path.map(String).join('.');
  return (otherDeviationFieldNames as readonly string[]).includes(name) ? (name as OtherDeviationFieldName) : null;
}

const plainerWords: Partial<Record<OtherDeviationFieldName, string>> = {
  'costImpact.kind': 'Say whether the change costs more, less, or the same.',
  planSheets: 'Each plan sheet is at most 40 characters; separate sheets with commas.',
};

export function fieldMessage(field: OtherDeviationFieldName, path: readonly PropertyKey[], message: string): string {
  const generic = message.startsWith('Invalid input') || message.startsWith('Too small') || message.startsWith('Too big');
  if (field === 'planSheets' && path.length === 1) return message;
  return generic ? (plainerWords[field] ?? message) : message;
}

export const otherDeviationSchema = formFields.transform((values, ctx): RequestBody => {
  const parsed = requestBodySchema.safeParse(otherDeviationBody(values));
  if (parsed.success) return parsed.data;
  const seen = new Set<string>();
  for (const issue of parsed.error.issues) {
    const field = fieldFor(issue.path);
    const target = field ?? 'root';
    if (seen.has(target)) continue;
    seen.add(target);
    ctx.addIssue({ code: 'custom', path: target.split('.'), message: field ? fieldMessage(field, issue.path, issue.message) : issue.message });
  }
  return z.NEVER;
});
