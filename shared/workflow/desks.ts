// The desks a request can wait at and how long it may wait at each before reminders go out.
import type { Role } from '../roles';

export const deskRoles = ['contractor', 'section_engineer', 'central_office', 'engineer_of_record', 'field_inspector'] as const satisfies readonly Role[];
export type DeskRole = (typeof deskRoles)[number];
export type DeskDueDays = Record<DeskRole, number>;

// Our defaults; each project may set its own.
export const defaultDeskDueDays: DeskDueDays = {
  contractor: 14,
  section_engineer: 5,
  central_office: 3,
  engineer_of_record: 10,
  field_inspector: 7,
};
