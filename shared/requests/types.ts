// Shapes the API returns for requests; the client renders them, the server builds them.
import type { Role } from '../roles';
import type { DeskRole } from '../workflow/desks';
import type { MachineEventType, WorkflowFacts } from '../workflow/rules';
import type { RequestDraft } from './requestBody';

export type PersonRef = { id: string; name: string; organization: string | null };

export type AttachmentSummary = {
  id: string;
  revision: number;
  purpose: string;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: string;
  uploadedAt: string;
};

export type TrailEntry = {
  seq: number;
  eventType: string;
  stateBefore: string | null;
  stateAfter: string;
  actor: PersonRef;
  actorRole: Role;
  comment: string | null;
  payload: Record<string, unknown>;
  at: string;
  hash: string;
};

export type RevisionChange = { path: string; before: unknown; after: unknown };

export type RevisionView = {
  revision: number;
  body: RequestDraft;
  engineering: unknown;
  createdAt: string;
  submittedAt: string | null;
  // What differs from the revision before it; empty for the first.
  changes: RevisionChange[];
};

export type ConditionView = {
  id: string;
  seq: number;
  text: string;
  dueBefore: string;
  satisfied: boolean;
  satisfiedBy: PersonRef | null;
  satisfiedAt: string | null;
  note: string | null;
  evidenceAttachmentId: string | null;
};

export type RequestSummary = {
  id: string;
  number: string;
  type: string;
  title: string;
  state: string;
  version: number;
  currentRevision: number;
  project: { id: string; code: string; name: string; structureNumber: string };
  filedBy: PersonRef;
  assignedEor: PersonRef | null;
  deskSince: string;
  // The desk it waits at (null once settled), when it falls due there, and whether that has passed.
  desk: DeskRole | null;
  dueAt: string | null;
  overdue: boolean;
  createdAt: string;
  updatedAt: string;
};

export type RequestPage = { items: RequestSummary[]; nextCursor: string | null };

export type RequestDetail = RequestSummary & {
  decision: string | null;
  facts: WorkflowFacts;
  revisions: RevisionView[];
  attachments: AttachmentSummary[];
  conditions: ConditionView[];
  trail: TrailEntry[];
  availableActions: MachineEventType[];
};

export type ProjectSummary = {
  id: string;
  code: string;
  name: string;
  structureNumber: string;
  featureCarried: string;
  featureCrossed: string;
  county: string;
  federalAid: boolean;
};

export type Actor = { id: string; name: string; email: string; role: Role; organization: string | null };
