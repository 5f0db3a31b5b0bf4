// How a changed field is named and its values written where revisions are compared: on the
// request's page and on the review step of a revision being prepared, so both read alike.
import { bodyFieldLabels } from '../../shared/requests/bodyFields';

// The words a reviewer knows from the request's page; the typed parts fall back to the labels the
// decision record uses.
const fieldNames: Record<string, string> = {
  title: 'Title',
  'location.description': 'Where on the structure',
  'location.span': 'Span',
  'location.station': 'Station',
  planSheets: 'Plan sheets',
  reason: 'Reason',
  proposedChange: 'Proposed change',
  neededBy: 'Decision needed by',
  'costImpact.kind': 'Cost impact',
  'costImpact.amountUsd': 'Cost amount',
  contractTimeImpactDays: 'Contract-time impact',
};

const recordLabels = new Map(bodyFieldLabels);

export function changedFieldName(path: string): string {
  return fieldNames[path] ?? recordLabels.get(path) ?? path;
}

export function changedValue(value: unknown): string {
  if (value === null || value === undefined || value === '') return '(empty)';
  if (Array.isArray(value)) return value.length ? value.join(', ') : '(none)';
  return String(value);
}
