import { requestTypeLabels, requestTypes, type RequestType } from '../../shared/requests/requestBody';

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

export function formatWhen(iso: string): string {
  const d = new Date(iso);
  return d.toLocaleString(undefined, { year: 'numeric', month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });
}

// A calendar date from the form (YYYY-MM-DD). Read as a local date: as an ISO instant it would be
// midnight UTC, the day before west of Greenwich.
export function formatDay(isoDate: string): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (!m) return isoDate;
  const d = new Date(Number(m[1]), Number(m[2]) - 1, Number(m[3]));
  return d.toLocaleDateString(undefined, { weekday: 'short', year: 'numeric', month: 'short', day: 'numeric' });
}

export function formatUsd(amount: number): string {
  return amount.toLocaleString(undefined, { style: 'currency', currency: 'USD', maximumFractionDigits: 2 });
}

export function formatCostImpact(cost: { kind: string; amountUsd?: number } | undefined): string {
  if (!cost) return 'Not stated';
  if (cost.kind === 'none') return 'No change in cost';
  const amount = typeof cost.amountUsd === 'number' ? formatUsd(cost.amountUsd) : 'amount not stated';
  return cost.kind === 'credit' ? `Credit to the owner of ${amount}` : `Added cost of ${amount}`;
}

export function formatDays(days: number | undefined): string {
  if (days === undefined) return 'Not stated';
  if (days === 0) return 'None';
  const n = Math.abs(days);
  return `${n} ${n === 1 ? 'day' : 'days'} ${days > 0 ? 'added' : 'saved'}`;
}

export function isRequestType(value: string): value is RequestType {
  return (requestTypes as readonly string[]).includes(value);
}

export function requestTypeLabel(type: string): string {
  return isRequestType(type) ? requestTypeLabels[type] : type;
}
