// When a request falls due at the desk it sits at: the project's days for that desk, counted from
// the moment it arrived there. The reminders (server/workflow/deskReminders.ts) use the same days.
import { defaultDeskDueDays, type DeskDueDays, type DeskRole } from '../workflow/desks';
import { isRequestState, requestStateInfo } from './states';

const dayMs = 24 * 60 * 60 * 1000;

export function deskOf(state: string): DeskRole | null {
  return isRequestState(state) ? requestStateInfo[state].desk : null;
}

export function deskDueAt(state: string, deskSince: Date, dueDays: Partial<DeskDueDays> | null | undefined): Date | null {
  const desk = deskOf(state);
  if (!desk) return null;
  const days = dueDays?.[desk] ?? defaultDeskDueDays[desk];
  return new Date(deskSince.getTime() + days * dayMs);
}
