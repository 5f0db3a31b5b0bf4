// What the people-and-projects calls answer; the administrator's screens render these.
import type { Role } from '../roles';
import type { DeskDueDays } from '../workflow/desks';

export type ProjectRef = { id: string; code: string; name: string };

export type PersonRow = {
  id: string;
  name: string;
  email: string;
  role: Role;
  organization: string | null;
  projects: ProjectRef[];
};

export type ProjectMember = { id: string; name: string; email: string; role: Role; organization: string | null };

export type AdminProject = ProjectRef & {
  structureNumber: string;
  deskDueDays: DeskDueDays;
  members: ProjectMember[];
};

export type PendingInvitation = {
  id: string;
  email: string;
  name: string;
  role: Role;
  organization: string | null;
  projects: ProjectRef[];
  invitedBy: string;
  expiresAt: string;
  expired: boolean;
  createdAt: string;
};

// What the invited person sees before choosing a password.
export type InvitationPreview = { email: string; name: string; role: Role; organization: string | null; projects: string[] };
