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

const minuteMs = 60_000;
const hourMs = 60 * minuteMs;
const dayMs = 24 * hourMs;

// A span of waiting in the largest unit that keeps it honest: "40 minutes", "5 hours", "3 days".
export function formatSpan(ms: number): string {
  const plural = (n: number, unit: string) => `${n} ${unit}${n === 1 ? '' : 's'}`;
  const abs = Math.max(0, ms);
  if (abs < hourMs) return plural(Math.max(1, Math.floor(abs / minuteMs)), 'minute');
  if (abs < 2 * dayMs) return plural(Math.floor(abs / hourMs), 'hour');
  return plural(Math.floor(abs / dayMs), 'day');
}

// What a card says about the desk clock: how long it has waited and when it falls due.
export function deskClockText(r: { deskSince: string; dueAt: string | null; overdue: boolean }, now: number = Date.now()): { waited: string; due: string | null } {
  const waited = `${formatSpan(now - new Date(r.deskSince).getTime())} at this desk`;
  if (!r.dueAt) return { waited, due: null };
  const dueMs = new Date(r.dueAt).getTime();
  const day = new Date(r.dueAt).toLocaleDateString(undefined, { weekday: 'short', month: 'short', day: 'numeric' });
  return { waited, due: r.overdue ? `overdue by ${formatSpan(now - dueMs)} (due ${day})` : `due ${day}` };
}
